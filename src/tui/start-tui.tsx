import { userInfo } from 'node:os';
import { render } from 'ink';
import { openCatalog, type Catalog } from '../catalog/open-catalog.js';
import { App } from './app.js';
import { ThemeContext } from './hooks/use-theme.js';
import { catalogService } from './io/catalog-service.js';
import { substringSearch, type PartSearch } from './hooks/use-part-search.js';
import type { DesignService, PartPager, TuiServices } from './services.js';
import { themeFor } from './theme.js';

export interface StartOptions {
  readonly catalogPath: string;
  readonly isDemo: boolean;
  readonly hasCatalog: boolean;
}

function currentUser(): string {
  try {
    return userInfo().username || 'unknown';
  } catch {
    return process.env.USER ?? 'unknown';
  }
}

/**
 * Opens the catalog (nothing else is read at start: the parts are paged in as screens need
 * them) and runs the interface until the user quits.
 */
export async function startTui({ catalogPath, isDemo, hasCatalog }: StartOptions): Promise<void> {
  const user = currentUser();
  const opened: Catalog[] = [];
  const open = (path: string) => {
    const catalog = openCatalog(path, { create: false });
    opened.push(catalog);
    return catalog;
  };
  // The catalog search and its query language load after the first frame; until then (a moment)
  // lists are searched by plain substrings.
  let loaded: typeof import('./io/query-search.js') | undefined;
  const search: PartSearch = (parts, query) => (loaded?.querySearch ?? substringSearch)(parts, query);
  const options = { user, search, searchPager: (catalog: Catalog, browse: PartPager) => loaded?.searchPager(catalog, browse) };
  // The demo is offered only when there is no catalog yet: only then load the importer it needs.
  const demo = hasCatalog ? undefined : await import('../catalog/demo-catalog.js');
  // Design files (YAML) are only read on the design screens: that module loads just after the
  // first frame. In the bundle the import settles before any key can be read.
  let designs: DesignService | undefined;
  const afterFirstFrame = new Proxy({} as DesignService, {
    get: (_, key) => {
      if (!designs) throw new Error('design files are still loading; try again');
      return designs[key as keyof DesignService];
    },
  });
  const services: TuiServices = {
    catalog: hasCatalog ? catalogService(open(catalogPath), isDemo ? 'demo' : catalogPath, options) : null,
    openDemo: () => {
      if (!demo) throw new Error('the demo catalog is offered only when no catalog is open');
      return catalogService(open(demo.ensureDemoCatalog()), 'demo', options);
    },
    designs: afterFirstFrame,
    user,
    search,
    queryProblems: (text) => loaded?.queryProblems(text) ?? [],
  };
  const app = render(
    <ThemeContext.Provider value={themeFor()}>
      <App services={services} catalogPath={catalogPath} />
    </ThemeContext.Provider>,
    { exitOnCtrlC: false },
  );
  void import('./io/design-service.js').then((m) => (designs = m.designService()));
  setTimeout(() => {
    import('./io/query-search.js').then(
      (m) => (loaded = m),
      () => undefined,
    );
  }, 0);
  try {
    await app.waitUntilExit();
  } finally {
    for (const catalog of opened) catalog.close();
  }
}
