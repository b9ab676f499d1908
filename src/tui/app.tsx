import { useApp, useStdout } from 'ink';
import { useState } from 'react';
import type { Part } from '../parts/index.js';
import { BrowseScreen } from './screens/browse-screen.js';
import { WelcomeScreen } from './screens/welcome-screen.js';

export interface AppProps {
  /** Parts of the open catalog, or null when there is no catalog yet. */
  readonly parts: readonly Part[] | null;
  readonly catalogLabel: string;
  /** Opens the demo catalog and returns its parts. */
  readonly loadDemo: () => { parts: readonly Part[]; label: string };
}

export function App({ parts, catalogLabel, loadDemo }: AppProps) {
  const { exit } = useApp();
  const { stdout } = useStdout();
  const [open, setOpen] = useState(parts ? { parts, label: catalogLabel } : null);
  const width = stdout.columns || 80;
  const height = stdout.rows || 24;
  if (!open) {
    return <WelcomeScreen catalogPath={catalogLabel} onOpenDemo={() => setOpen(loadDemo())} onQuit={exit} />;
  }
  return <BrowseScreen parts={open.parts} catalogLabel={open.label} width={width} height={height} onQuit={exit} />;
}
