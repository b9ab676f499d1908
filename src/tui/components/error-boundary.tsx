import { Box, Text } from 'ink';
import { Component, type ReactNode } from 'react';

interface State {
  readonly error: Error | null;
}

/** Shows a crash readably instead of a blank terminal, with what to do next. */
export class ErrorBoundary extends Component<{ readonly children: ReactNode }, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <Box flexDirection="column">
        <Text bold>Headroom stopped because of an internal error:</Text>
        <Text>{this.state.error.message}</Text>
        <Text>Press Ctrl+C to leave. The command line (headroom --help) works without these screens.</Text>
      </Box>
    );
  }
}
