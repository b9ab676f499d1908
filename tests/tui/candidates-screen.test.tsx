import { describe, expect, it } from 'vitest';
import { CandidatesScreen } from '../../src/tui/screens/candidates-screen.js';
import { aPart } from '../helpers/a-part.js';
import { renderScreen } from './support/render-app.js';
import { KEY, press, type, waitFor, widestLine } from '../helpers/render-tui.js';
import { coilParts, coilSession, mainsSession } from './support/tui-fixtures.js';
import { testServices } from './support/tui-services.js';

async function candidates(parts = coilParts, options: { columns?: number; session?: ReturnType<typeof coilSession> } = {}) {
  const columns = options.columns ?? 80;
  const r = renderScreen(<CandidatesScreen session={options.session ?? coilSession()} width={columns} height={24} isActive />, testServices(parts), { columns });
  await waitFor(r.lastFrame, 'sort score');
  await waitFor(() => (r.lastFrame().includes('Ranking') ? '' : 'ranked'), 'ranked');
  return r;
}

describe('candidates', () => {
  it('ranks the parts with a verdict symbol and a bar per limit, unknowns as ?', async () => {
    const { lastFrame } = await candidates();
    const frame = lastFrame();
    expect(frame).toMatch(/Part\s+Package\s+VRRM\s+IFSM\s+Tj\s+Score/);
    expect(frame).toMatch(/✓\s+1 GOOD-1\s+SMA\s+ █/);
    expect(frame).toMatch(/NOIFSM\s+SMA\s+ █+[▏▎▍▌▋▊▉]?·* \?/);
    expect(frame).toMatch(/!\s+\d+ LOWV\s+SMA\s+!·+/);
    expect(frame).toContain('1 pass');
    expect(frame).toContain('✓ pass — passes every limit; tightest: VRRM');
    expect(widestLine(frame)).toBeLessThanOrEqual(80);
  });

  it('filters as you type after /, and Esc clears the search', async () => {
    const { lastFrame, stdin } = await candidates();
    await press(stdin, '/');
    await type(stdin, 'noifsm');
    await waitFor(lastFrame, '1 shown');
    expect(lastFrame()).toContain('NOIFSM');
    expect(lastFrame()).not.toContain('GOOD-1');
    await press(stdin, KEY.enter);
    await press(stdin, KEY.escape);
    await waitFor(lastFrame, 'GOOD-1');
  });

  it('sorts by price and hides unknowns', async () => {
    const { lastFrame, stdin } = await candidates();
    await press(stdin, 's');
    expect(lastFrame()).toContain('sort price');
    expect(lastFrame().indexOf('LOWV')).toBeLessThan(lastFrame().indexOf('GOOD-1'));
    await press(stdin, 'f', 'f');
    expect(lastFrame()).toContain('fails and unknowns hidden');
    expect(lastFrame()).not.toContain('NOIFSM');
    expect(lastFrame()).not.toContain('NORTH');
  });

  it('says when nothing passes, and lists the closest', async () => {
    const { lastFrame } = await candidates(coilParts.filter((p) => p.partNumber !== 'GOOD-1'));
    expect(lastFrame()).toContain('No part passes every limit');
    expect(lastFrame()).toContain('LOWV');
  });

  it('says what the catalog was asked for when no part meets the ratings', async () => {
    const { lastFrame } = await candidates([]);
    expect(lastFrame()).toContain('No part in the catalog meets the ratings');
    expect(lastFrame()).toContain('kind');
  });

  it('cuts very long part numbers and makers to their columns at every width', async () => {
    const long = [aPart('schottky', { kind: 'rectifier', partNumber: 'LONG-' + 'Q'.repeat(80), manufacturer: 'M'.repeat(90), vrrmV: 100, ifsmA: 30, rthJaKPerW: 100 })];
    for (const columns of [80, 120, 160]) {
      const { lastFrame } = await candidates(long, { columns });
      expect(lastFrame()).toMatch(/LONG-Q+…/);
      expect(widestLine(lastFrame())).toBeLessThanOrEqual(columns);
    }
    const { lastFrame } = await candidates(long, { columns: 160 });
    expect(lastFrame()).toMatch(/M+…/);
  });

  it('opens a part with Enter and assigns with a', async () => {
    const { stdin, routes } = await candidates();
    await press(stdin, KEY.enter, 'a');
    expect(routes.map((r) => (typeof r === 'string' ? r : r.name))).toEqual(['candidate', 'assign']);
  });

  it('carries the safety caution of a mains position at the top', async () => {
    const { lastFrame } = await candidates(coilParts, { session: mainsSession() });
    expect(lastFrame().split('\n')[1]).toContain('⚠ SAFETY  Hazardous voltage or surge protection');
  });
});
