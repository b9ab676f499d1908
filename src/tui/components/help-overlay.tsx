import { Box, Text } from 'ink';
import { useTheme } from '../hooks/use-theme.js';
import { describeCommands, type ScreenCommand } from '../keys.js';
import { fit, wrap } from '../text/fit.js';

export interface HelpOverlayProps {
  readonly commands: readonly ScreenCommand[];
  readonly width: number;
  readonly height: number;
  /** A few words about the screen, above the keys. */
  readonly about?: string;
}

const LEGEND = 'Verdicts: ✓ pass · ! marginal · ✗ fail · ? unknown (the catalog lacks a value). Bars show headroom per limit; the shortest is the tightest margin.';

/** The keys of the screen in view, built from keys.ts; any key closes it. */
export function HelpOverlay({ commands, width, height, about }: HelpOverlayProps) {
  const theme = useTheme();
  const all: ScreenCommand[] = [...commands, 'help', 'quit', 'forceQuit'];
  const keys = describeCommands(all.filter((c, i) => all.indexOf(c) === i));
  const labelWidth = Math.max(...keys.map((k) => k.label.length)) + 2;
  const lines = [
    ...(about ? wrap(about, width - 2) : []),
    ...keys.flatMap((k) => wrap(`${fit(k.label, labelWidth)}${k.help}`, width - 2, labelWidth)),
    ' ',
    ...wrap(LEGEND, width - 2),
    ...wrap('Letter keys are commands, except while typing: in text fields and after / they are text.', width - 2),
  ].slice(0, Math.max(1, height - 1));
  return (
    <Box flexDirection="column">
      <Text bold color={theme.accent}>
        Keys (any key closes)
      </Text>
      {lines.map((line, i) => (
        <Text key={i}>{line}</Text>
      ))}
    </Box>
  );
}
