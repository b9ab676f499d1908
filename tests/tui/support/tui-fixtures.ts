import { aPart } from '../../helpers/a-part.js';
import { solvedSession } from './render-app.js';

/**
 * Parts for a relay-coil freewheel position (VRRM ≥ 40 V after derating, IFSM ≥ 50 mA, Tj):
 * one that passes, one short of the derated VRRM, one without IFSM and one without RθJA.
 */
export const coilParts = [
  aPart('schottky', { kind: 'rectifier', partNumber: 'GOOD-1', vrrmV: 100, ifsmA: 30, rthJaKPerW: 100, unitPrice: 0.12, currency: 'EUR' }),
  aPart('schottky', { kind: 'rectifier', partNumber: 'LOWV', vrrmV: 35, ifsmA: 30, rthJaKPerW: 100, unitPrice: 0.05, currency: 'EUR' }),
  aPart('schottky', { kind: 'rectifier', partNumber: 'NOIFSM', vrrmV: 100, ifAvA: 1, rthJaKPerW: 100 }),
  aPart('schottky', { kind: 'signal', partNumber: 'NORTH', vrrmV: 100, ifsmA: 5, ifAvA: 0.2 }),
];

export const coilValues = { supply_max: '32 V', coil_resistance: '800 Ω', coil_inductance: '0.6 H', ambient_max: '70 °C' };

export const coilSession = () => solvedSession('coil-freewheel', coilValues);

/** A bridge straight on 240 V mains: hazardous, so every screen of it carries the safety caution. */
export const mainsSession = () =>
  solvedSession('rectifier', { configuration: 'bridge', v_secondary_rms: '240 V', load_current: '0.2 A', capacitance: '47 µF', inrush_limiter: '20 Ω', is_mains_connected: 'true', ambient_max: '85 °C' }, 'industrial');

/** A 1 kV, 1 A rectifier that suits the mains bridge. */
export const mainsParts = [aPart('schottky', { kind: 'rectifier', partNumber: 'MAINS-1K', vrrmV: 1000, ifAvA: 1, ifsmA: 60, rthJaKPerW: 80, vfPoints: [{ vfV: 1, ifA: 1, tjK: 298.15 }] })];
