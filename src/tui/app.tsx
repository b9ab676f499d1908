import { Box, Text } from 'ink';
import { Suspense, useEffect, useMemo } from 'react';
import { ErrorBoundary } from './components/error-boundary.js';
import { useKeyRouter } from './hooks/use-key-router.js';
import { HelpContext, KeyRouterContext, ScreenIdContext } from './hooks/use-keys.js';
import { NavigatorContext, type Navigator } from './hooks/use-navigator.js';
import { ServicesContext, type OpenServices } from './hooks/use-services.js';
import { useSyncReducer, useSyncState } from './hooks/use-sync-state.js';
import { useTerminalSize } from './hooks/use-terminal-size.js';
import { HomeScreen } from './screens/home-screen.js';
import {
  AddPartScreen,
  ApprovalScreen,
  AssignScreen,
  BrowseScreen,
  CandidateScreen,
  CandidatesScreen,
  DesignOpenScreen,
  EditPartScreen,
  PartScreen,
  PositionFormScreen,
  PositionScreen,
  RoleScreen,
  SubstituteScreen,
  preloadScreens,
} from './screens/lazy-screens.js';
import type { ScreenProps } from './screens/screen-props.js';
import { WelcomeScreen } from './screens/welcome-screen.js';
import type { TuiServices } from './services.js';
import { initialNav, navReducer, type Route } from './state/navigation.js';

export interface AppProps {
  readonly services: TuiServices;
  /** Where the catalog would be, for the welcome screen when there is none. */
  readonly catalogPath: string;
}

function screenFor(route: Route, props: ScreenProps) {
  switch (route.name) {
    case 'home':
      return <HomeScreen {...props} />;
    case 'roles':
      return <RoleScreen {...props} />;
    case 'form':
      return <PositionFormScreen {...props} draft={route.draft} />;
    case 'open-design':
      return <DesignOpenScreen {...props} />;
    case 'position':
      return <PositionScreen {...props} session={route.session} />;
    case 'candidates':
      return <CandidatesScreen {...props} session={route.session} />;
    case 'candidate':
      return <CandidateScreen {...props} session={route.session} candidate={route.candidate} />;
    case 'assign':
      return <AssignScreen {...props} session={route.session} part={route.part} />;
    case 'browse':
      return <BrowseScreen {...props} />;
    case 'part':
      return <PartScreen {...props} part={route.part} />;
    case 'approval':
      return <ApprovalScreen {...props} part={route.part} />;
    case 'add-part':
      return <AddPartScreen {...props} />;
    case 'edit-part':
      return <EditPartScreen {...props} part={route.part} />;
    case 'substitute':
      return <SubstituteScreen {...props} original={route.original} alternate={route.alternate} {...(route.session ? { session: route.session } : {})} />;
  }
}

const WELCOME = -1;

/**
 * The screen switch: a stack of routes, the top one shown and listening; those below stay
 * mounted but hidden, so going back finds them as they were.
 */
export function App({ services, catalogPath }: AppProps) {
  const { columns: width, rows: height } = useTerminalSize();
  const [catalog, setCatalog, getCatalog] = useSyncState(services.catalog);
  const [nav, dispatch, getNav] = useSyncReducer(navReducer, () => initialNav());
  const router = useKeyRouter(() => (getCatalog() ? getNav().stack[getNav().stack.length - 1]!.id : WELCOME));
  const [isHelpOpen, setHelpOpen, isHelpOpenNow] = useSyncState(false);
  const help = useMemo(() => ({ isOpen: isHelpOpen, isOpenNow: isHelpOpenNow, setOpen: setHelpOpen }), [isHelpOpen, isHelpOpenNow, setHelpOpen]);
  const navigator = useMemo<Navigator>(
    () => ({
      push: (route) => dispatch({ type: 'push', route }),
      back: () => dispatch({ type: 'pop' }),
      home: () => dispatch({ type: 'home' }),
      backTo: (name) => dispatch({ type: 'popTo', name }),
    }),
    [],
  );
  const open = useMemo<OpenServices | null>(
    () =>
      catalog
        ? {
            catalog,
            designs: services.designs,
            user: services.user,
            ...(services.search ? { search: services.search } : {}),
            ...(services.queryProblems ? { queryProblems: services.queryProblems } : {}),
          }
        : null,
    [catalog, services],
  );
  // The first screen is drawn before the others are even loaded; they follow in the background.
  useEffect(() => {
    const timer = setTimeout(preloadScreens, 0);
    return () => clearTimeout(timer);
  }, []);
  const top = nav.stack.length - 1;
  return (
    <ErrorBoundary>
      <HelpContext.Provider value={help}>
        <KeyRouterContext.Provider value={router}>
        {open === null ? (
          <ScreenIdContext.Provider value={WELCOME}>
            <WelcomeScreen catalogPath={catalogPath} onOpenDemo={() => setCatalog(services.openDemo())} width={width} height={height} isActive />
          </ScreenIdContext.Provider>
        ) : (
          <ServicesContext.Provider value={open}>
            <NavigatorContext.Provider value={navigator}>
              {nav.stack.map((entry, i) => (
                <Box key={entry.id} display={i === top ? 'flex' : 'none'} flexDirection="column">
                  <ScreenIdContext.Provider value={entry.id}>
                    <Suspense fallback={<Text>Loading…</Text>}>{screenFor(entry.route, { width, height, isActive: i === top })}</Suspense>
                  </ScreenIdContext.Provider>
                </Box>
              ))}
            </NavigatorContext.Provider>
          </ServicesContext.Provider>
        )}
        </KeyRouterContext.Provider>
      </HelpContext.Provider>
    </ErrorBoundary>
  );
}
