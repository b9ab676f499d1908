import { createContext, useContext } from 'react';
import type { CatalogService, DesignService } from '../services.js';
import type { PartSearch } from './use-part-search.js';

/** The services once a catalog is open: what every screen after the welcome uses. */
export interface OpenServices {
  readonly catalog: CatalogService;
  readonly designs: DesignService;
  readonly user: string;
  readonly search?: PartSearch;
  readonly queryProblems?: (text: string) => readonly string[];
}

export const ServicesContext = createContext<OpenServices | null>(null);

export function useServices(): OpenServices {
  const services = useContext(ServicesContext);
  if (!services) throw new Error('useServices outside ServicesContext: App provides it once a catalog is open');
  return services;
}
