import { Box, Text } from 'ink';
import type { Caution } from '../../circuits/caution.js';
import { useTheme } from '../hooks/use-theme.js';
import { wrap } from '../text/fit.js';

/** The caution's lines: in full, or its first sentence where space is short. */
export function safetyLines(cautions: readonly Caution[], width: number, isFull: boolean): string[] {
  return cautions.flatMap((c) => {
    const text = isFull ? c.text : (c.text.match(/^.*?\.(\s|$)/)?.[0] ?? c.text).trim();
    return wrap(`⚠ SAFETY  ${text}`, width, 2);
  });
}

export interface SafetyBannerProps {
  readonly cautions: readonly Caution[];
  readonly width: number;
  /** The whole text (the limits view) rather than its first sentence. @default false */
  readonly isFull?: boolean;
}

/** Shown at the top of every screen of a position that involves hazardous voltage or surge protection. */
export function SafetyBanner({ cautions, width, isFull = false }: SafetyBannerProps) {
  const theme = useTheme();
  if (cautions.length === 0) return null;
  return (
    <Box flexDirection="column">
      {safetyLines(cautions, width, isFull).map((line, i) => (
        <Text key={i} color={theme.safety} bold>
          {line}
        </Text>
      ))}
    </Box>
  );
}
