import { render } from 'ink';
import { ensureDemoCatalog, listParts, openCatalog } from '../catalog/index.js';
import type { Part } from '../parts/index.js';
import { App } from './app.js';
import { ThemeContext } from './hooks/use-theme.js';
import { themeFor } from './theme.js';

export interface StartOptions {
  readonly catalogPath: string;
  readonly isDemo: boolean;
  readonly hasCatalog: boolean;
}

function readParts(path: string): readonly Part[] {
  const catalog = openCatalog(path, { create: false });
  try {
    return listParts(catalog);
  } finally {
    catalog.close();
  }
}

export async function startTui({ catalogPath, isDemo, hasCatalog }: StartOptions): Promise<void> {
  const label = isDemo ? 'demo' : catalogPath;
  const loadDemo = () => ({ parts: readParts(ensureDemoCatalog()), label: 'demo' });
  const app = render(
    <ThemeContext.Provider value={themeFor()}>
      <App parts={hasCatalog ? readParts(catalogPath) : null} catalogLabel={label} loadDemo={loadDemo} />
    </ThemeContext.Provider>,
    { exitOnCtrlC: false },
  );
  await app.waitUntilExit();
}
