import { Box, Text } from 'ink';
import type { ReactNode } from 'react';
import type { Caution } from '../../circuits/caution.js';
import { useHelp } from '../hooks/use-keys.js';
import { useTheme } from '../hooks/use-theme.js';
import { helpLine, type ScreenCommand } from '../keys.js';
import { safeText } from '../../parts/index.js';
import { truncate } from '../text/fit.js';
import { HelpOverlay } from './help-overlay.js';
import { SafetyBanner, safetyLines } from './safety-banner.js';

export interface ScreenFrameProps {
  /** Where the user is: "New position › Rectifier". */
  readonly title: string;
  readonly width: number;
  readonly height: number;
  readonly commands: readonly ScreenCommand[];
  /** Safety cautions of the position on view, shown above everything else. */
  readonly safety?: readonly Caution[];
  readonly isSafetyFull?: boolean;
  /** Words for the key overlay about this screen. */
  readonly about?: string;
  readonly children: ReactNode;
}

/** Rows the frame itself takes (title, safety lines, footer); the body gets the rest. */
export function frameRows(width: number, safety: readonly Caution[] = [], isSafetyFull = false): number {
  return 2 + safetyLines(safety, width, isSafetyFull).length;
}

/** Title line, safety caution, the screen's body (or the key overlay) and the key footer. */
export function ScreenFrame({ title, width, height, commands, safety = [], isSafetyFull = false, about, children }: ScreenFrameProps) {
  const theme = useTheme();
  const help = useHelp();
  const body = height - frameRows(width, safety, isSafetyFull);
  return (
    <Box flexDirection="column" width={width} height={height}>
      <Text wrap="truncate-end">
        <Text bold color={theme.accent}>
          Headroom
        </Text>
        <Text color={theme.muted}> › </Text>
        <Text bold>{truncate(safeText(title), Math.max(1, width - 12))}</Text>
      </Text>
      <SafetyBanner cautions={safety} width={width} isFull={isSafetyFull} />
      <Box flexDirection="column" height={Math.max(1, body)} overflow="hidden">
        {help.isOpen ? <HelpOverlay commands={commands} width={width} height={body} {...(about ? { about } : {})} /> : children}
      </Box>
      <Text color={theme.muted} wrap="truncate-end">
        {helpLine(commands, width)}
      </Text>
    </Box>
  );
}
