import { openCatalog, writeParts, type Catalog } from '../../../src/catalog/index.js';
import type { Part } from '../../../src/parts/index.js';
import { aPart } from '../../helpers/a-part.js';

/** Invented parts covering every kind family, several makers and packages. */
export function fixtureParts(): Part[] {
  const brackwater = { manufacturer: 'Brackwater Semiconductor' };
  const ketterby = { manufacturer: 'Ketterby Components' };
  const velmora = { manufacturer: 'Velmora Power' };
  return [
    aPart('schottky', { ...brackwater, partNumber: 'BWS3-40A', package: 'SMA', vrrmV: 40, ifAvA: 3, description: 'Schottky rectifier 40 V 3 A' }),
    aPart('schottky', { ...brackwater, partNumber: 'BWS1-40W', package: 'SOD-123', vrrmV: 40, ifAvA: 1, approval: 'approved', vfPoints: [{ vfV: 0.45, ifA: 1, tjK: 298.15 }, { vfV: 0.38, ifA: 1, tjK: 398.15 }] }),
    aPart('schottky', { manufacturer: 'Ashgrove Devices', partNumber: 'AG-SK100-S', package: 'SMB', vrrmV: 100, ifAvA: 1, approval: 'preferred', description: 'Schottky 100 V, automotive, low leakage', vfPoints: [{ vfV: 0.3, ifA: 0.1, tjK: 298.15 }, { vfV: 0.7, ifA: 1, tjK: 298.15 }] }),
    aPart('schottky', { ...ketterby, partNumber: 'KTR-1A1000-L', kind: 'rectifier', package: 'DO-41', vrrmV: 1000, ifAvA: 1, description: 'Axial rectifier 1000 V 1 A', unitPrice: 0.016, currency: 'EUR' }),
    aPart('schottky', { ...ketterby, partNumber: 'KTR-1A600-L', kind: 'rectifier', package: 'DO-41', vrrmV: 600, ifAvA: 1, lifecycle: 'nrnd', unitPrice: 0.015, currency: 'EUR' }),
    aPart('schottky', { ...ketterby, partNumber: 'KTU-2A600-A', kind: 'ultrafast', package: 'SMA', vrrmV: 600, ifAvA: 2, trrS: 35e-9, cjF: 12e-12, secondSourceGroup: 'UF2A600-SMA' }),
    aPart('zener', { ...velmora, partNumber: 'VPZ-5V1C-W', vzV: 5.1, vzTol: 0.02, approval: 'approved' }),
    aPart('zener', { ...velmora, partNumber: 'VPZ-5V1B-W', vzV: 5.1, vzTol: 0.05 }),
    aPart('tvs', { ...velmora, partNumber: 'VPT-24CA-B', kind: 'tvs-bi', vrwmV: 24, vbrMinV: 26.7, vbrMaxV: 29.5, vcV: 38.9, ippA: 15.4, pppmW: 600, approval: 'preferred' }),
    aPart('tvs', { partNumber: 'TW-T33U', lifecycle: 'obsolete' }),
  ];
}

/** A fresh in-memory catalog at the latest schema holding the fixture parts. */
export function fixtureCatalog(parts: readonly Part[] = fixtureParts()): Catalog {
  const catalog = openCatalog(':memory:');
  writeParts(catalog, parts, { by: 'test', reason: 'fixture', at: '2026-01-05T09:00:00.000Z' });
  return catalog;
}
