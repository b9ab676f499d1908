import { Box, Text, useInput } from 'ink';
import { useTheme } from '../hooks/use-theme.js';
import { commandFor } from '../keys.js';

export interface WelcomeScreenProps {
  readonly catalogPath: string;
  readonly onOpenDemo: () => void;
  readonly onQuit: () => void;
}

/** First run: there is no catalog yet, so offer the demo and say how to import one's own parts. */
export function WelcomeScreen({ catalogPath, onOpenDemo, onQuit }: WelcomeScreenProps) {
  const theme = useTheme();
  useInput((input, key) => {
    if (commandFor(input, key) === 'quit' || input === 'q') onQuit();
    else if (input === 'd' || key.return) onOpenDemo();
  });
  return (
    <Box flexDirection="column" padding={1}>
      <Text bold color={theme.accent}>Welcome to Headroom</Text>
      <Text>There is no parts catalog at {catalogPath} yet.</Text>
      <Text> </Text>
      <Text>
        Press <Text bold>d</Text> (or Enter) to open the demo catalog: invented parts of an invented company,
        safe to explore.
      </Text>
      <Text>
        Press <Text bold>q</Text> to quit. To use your own parts: headroom catalog import FILE.csv
      </Text>
    </Box>
  );
}
