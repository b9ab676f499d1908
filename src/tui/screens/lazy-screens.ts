import { lazy } from 'react';

/*
 * Every screen but the first, loaded on demand: the home screen is on the terminal before the
 * circuit roles, the selection models and these screens are read. preloadScreens() then loads
 * them in the background, so moving on never waits.
 */

const loaders = {
  role: () => import('./role-screen.js'),
  form: () => import('./position-form-screen.js'),
  open: () => import('./design-open-screen.js'),
  position: () => import('./position-screen.js'),
  candidates: () => import('./candidates-screen.js'),
  candidate: () => import('./candidate-screen.js'),
  assign: () => import('./assign-screen.js'),
  browse: () => import('./browse-screen.js'),
  part: () => import('./part-screen.js'),
  approval: () => import('./approval-screen.js'),
  addPart: () => import('./add-part-screen.js'),
  editPart: () => import('./edit-part-screen.js'),
  substitute: () => import('./substitute-screen.js'),
};

export const RoleScreen = lazy(async () => ({ default: (await loaders.role()).RoleScreen }));
export const PositionFormScreen = lazy(async () => ({ default: (await loaders.form()).PositionFormScreen }));
export const DesignOpenScreen = lazy(async () => ({ default: (await loaders.open()).DesignOpenScreen }));
export const PositionScreen = lazy(async () => ({ default: (await loaders.position()).PositionScreen }));
export const CandidatesScreen = lazy(async () => ({ default: (await loaders.candidates()).CandidatesScreen }));
export const CandidateScreen = lazy(async () => ({ default: (await loaders.candidate()).CandidateScreen }));
export const AssignScreen = lazy(async () => ({ default: (await loaders.assign()).AssignScreen }));
export const BrowseScreen = lazy(async () => ({ default: (await loaders.browse()).BrowseScreen }));
export const PartScreen = lazy(async () => ({ default: (await loaders.part()).PartScreen }));
export const ApprovalScreen = lazy(async () => ({ default: (await loaders.approval()).ApprovalScreen }));
export const AddPartScreen = lazy(async () => ({ default: (await loaders.addPart()).AddPartScreen }));
export const EditPartScreen = lazy(async () => ({ default: (await loaders.editPart()).EditPartScreen }));
export const SubstituteScreen = lazy(async () => ({ default: (await loaders.substitute()).SubstituteScreen }));

/** Loads every screen module now; errors surface later, when the screen is opened. */
export function preloadScreens(): void {
  for (const load of Object.values(loaders)) load().catch(() => undefined);
}
