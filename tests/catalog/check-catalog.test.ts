import { describe, expect, it } from 'vitest';
import { checkCatalog, openCatalog, writeParts } from '../../src/catalog/index.js';
import { aPart } from '../helpers/a-part.js';

describe('the catalog check', () => {
  it('passes a sound catalog', () => {
    const catalog = openCatalog(':memory:');
    writeParts(catalog, [aPart('schottky', { manufacturer: 'Ferncombe', partNumber: 'FS-140A' })], { by: 't', reason: 'test' });
    expect(checkCatalog(catalog).isHealthy).toBe(true);
    catalog.close();
  });

  it('names a stored rating out of range in plain words with its unit, as an import would', () => {
    const catalog = openCatalog(':memory:');
    writeParts(catalog, [aPart('schottky', { manufacturer: 'Ferncombe', partNumber: 'FS-140A' })], { by: 't', reason: 'test' });
    // Written past Headroom's checks, by plain SQL.
    catalog.db.prepare('UPDATE part SET vrrm_v = 1e9').run();
    const report = checkCatalog(catalog);
    expect(report.isHealthy).toBe(false);
    expect(report.findings).toContainEqual({ check: 'part-schema', message: 'Ferncombe FS-140A: vrrmV must be at most 100 kV' });
    catalog.close();
  });
});
