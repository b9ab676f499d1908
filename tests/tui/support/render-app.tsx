import type { ReactElement } from 'react';
import { BUILT_IN_POLICIES } from '../../../src/circuits/derating.js';
import { findRole } from '../../../src/circuits/registry.js';
import type { RoleDefinition } from '../../../src/circuits/role.js';
import { App } from '../../../src/tui/app.js';
import { HelpContext } from '../../../src/tui/hooks/use-keys.js';
import { NavigatorContext, type Navigator } from '../../../src/tui/hooks/use-navigator.js';
import { ServicesContext } from '../../../src/tui/hooks/use-services.js';
import type { TuiServices } from '../../../src/tui/services.js';
import type { Route } from '../../../src/tui/state/navigation.js';
import type { PositionSession } from '../../../src/tui/state/position-draft.js';
import { renderTui, type RenderOptions } from '../../helpers/render-tui.js';

/** The whole interface over the given services, in a terminal of a fixed size (80×24 by default). */
export function renderApp(services: TuiServices, options: RenderOptions = {}) {
  return renderTui(<App services={services} catalogPath="/nowhere/catalog.sqlite" />, options);
}

/** One screen with the services it needs; navigation is recorded instead of performed. */
export function renderScreen(element: ReactElement, services: TuiServices, options: RenderOptions = {}) {
  const routes: (Route | 'back' | 'home' | string)[] = [];
  const nav: Navigator = {
    push: (route) => routes.push(route),
    back: () => routes.push('back'),
    home: () => routes.push('home'),
    backTo: (name) => routes.push(`backTo:${name}`),
  };
  let isOpen = false;
  const help = { get isOpen() { return isOpen; }, isOpenNow: () => isOpen, setOpen: (v: boolean) => { isOpen = v; } };
  const open = { catalog: services.catalog!, designs: services.designs, user: services.user };
  const result = renderTui(
    <HelpContext.Provider value={help}>
      <ServicesContext.Provider value={open}>
        <NavigatorContext.Provider value={nav}>{element}</NavigatorContext.Provider>
      </ServicesContext.Provider>
    </HelpContext.Provider>,
    options,
  );
  return { ...result, routes };
}

/** A position solved straight from typed conditions, as the form would hand it on. */
export function solvedSession(roleId: string, values: Record<string, string>, policyId = 'commercial'): PositionSession {
  const role = findRole(roleId) as RoleDefinition;
  const policy = BUILT_IN_POLICIES.find((p) => p.id === policyId)!;
  const conditions = role.schema.parse(
    Object.fromEntries(Object.entries(values).map(([k, v]) => [k, v === 'true' ? true : v === 'false' ? false : v])),
  );
  return { draft: { roleId: role.id, values, policyId, origin: null }, role, policy, result: role.solve(conditions as never, policy) };
}
