import { Box, Text } from 'ink';
import { ScreenFrame } from '../components/screen-frame.js';
import { useKeys } from '../hooks/use-keys.js';
import { useTheme } from '../hooks/use-theme.js';
import type { ScreenCommand } from '../keys.js';
import { wrap } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

export interface WelcomeScreenProps extends ScreenProps {
  readonly catalogPath: string;
  readonly onOpenDemo: () => void;
}

const COMMANDS: readonly ScreenCommand[] = ['openDemo', ['select', 'demo: open the demo catalog']];

/** First run: there is no catalog yet, so offer the demo and say how to import one's own parts. */
export function WelcomeScreen({ catalogPath, onOpenDemo, width, height, isActive }: WelcomeScreenProps) {
  const theme = useTheme();
  useKeys({ isActive, commands: COMMANDS }, (command) => {
    if (command === 'openDemo' || command === 'select') onOpenDemo();
  });
  const lines = [
    ...wrap(`There is no parts catalog at ${catalogPath} yet.`, width - 2),
    ' ',
    ...wrap('Press d (or Enter) to open the demo catalog: invented parts of an invented company, safe to explore.', width - 2),
    ...wrap('Press q to quit. To use your own parts: headroom catalog import FILE.csv', width - 2),
  ];
  return (
    <ScreenFrame title="Welcome" width={width} height={height} commands={COMMANDS}>
      <Box flexDirection="column" paddingLeft={1}>
        <Text bold color={theme.accent}>
          Welcome to Headroom
        </Text>
        {lines.map((line, i) => (
          <Text key={i}>{line}</Text>
        ))}
      </Box>
    </ScreenFrame>
  );
}
