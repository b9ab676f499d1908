import { describe, expect, it } from 'vitest';
import { CandidateScreen } from '../../src/tui/screens/candidate-screen.js';
import { PositionScreen } from '../../src/tui/screens/position-screen.js';
import { renderScreen, solvedSession } from './support/render-app.js';
import { KEY, press, pressUntil, widestLine } from '../helpers/render-tui.js';
import { coilParts, coilSession, mainsParts, mainsSession } from './support/tui-fixtures.js';
import { testServices } from './support/tui-services.js';

const position = (session = coilSession(), columns = 80, rows = 24) =>
  renderScreen(<PositionScreen session={session} width={columns} height={rows} isActive />, testServices(coilParts), { columns, rows });

describe('the limits of a position', () => {
  it('shows the operating point and each limit with its reason', () => {
    const { lastFrame } = position();
    expect(lastFrame()).toContain('OPERATING POINT (worst case)');
    expect(lastFrame()).toMatch(/Reverse voltage, peak\s+32.0 V/);
    expect(lastFrame()).toContain('VRRM ≥ 40.0 V');
    expect(lastFrame()).toContain('supply voltage 32.0 V ÷ 0.80 (commercial VRRM factor)');
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
  });

  it('scrolls to the derivation, every step with its numbers', async () => {
    const { lastFrame, stdin } = position();
    await pressUntil(stdin, lastFrame, KEY.pageDown, 'DERIVATION');
    await pressUntil(stdin, lastFrame, KEY.down, '= 32.0 V/800 Ω = 40.0 mA');
    expect(lastFrame()).toContain('▲');
  });

  it('puts limits and derivation side by side at 160 columns', () => {
    const { lastFrame } = position(coilSession(), 160, 48);
    const line = lastFrame().split('\n').find((l) => l.startsWith('Policy'))!;
    expect(line).toContain('DERIVATION');
    expect(lastFrame()).toContain('= 32.0 V/800 Ω = 40.0 mA');
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(160);
  });

  it('leads with the whole safety caution for a mains position', () => {
    const frame = position(mainsSession()).lastFrame();
    const lines = frame.split('\n');
    expect(lines[1]).toContain('⚠ SAFETY  Hazardous voltage or surge protection');
    expect(frame.replace(/\s+/g, ' ')).toContain('the design must be reviewed by qualified people');
  });

  it('says why a position cannot be built, with the steps so far', () => {
    const session = solvedSession('zener-regulator', { vin_min: '5 V', vin_max: '6 V', vz: '5V1', load_max: '100 mA', resistor: '1k' });
    const { lastFrame } = position(session);
    if (session.result.ok) throw new Error('expected an infeasible design for the test');
    expect(lastFrame()).toContain('NO FEASIBLE DESIGN');
    expect(lastFrame()).not.toContain('Enter candidates');
  });

  it('goes on to the candidates with Enter and back to the form with Esc', async () => {
    const { stdin, routes } = position();
    await press(stdin, KEY.enter, KEY.escape);
    expect(routes.map((r) => (typeof r === 'string' ? r : r.name))).toEqual(['candidates', 'back']);
  });
});

describe('one candidate in detail', () => {
  async function detail(session = coilSession(), partNumber = 'GOOD-1', columns = 80) {
    const services = testServices([...coilParts, ...mainsParts]);
    if (!session.result.ok) throw new Error('the fixture position should solve');
    const search = await services.catalog!.candidates(session.result.position, session.policy);
    const candidate = [...search.ranking.candidates, ...search.ranking.failed].find((c) => c.evaluation.part.partNumber === partNumber)!;
    return renderScreen(<CandidateScreen session={session} candidate={candidate} width={columns} height={24} isActive />, services, { columns });
  }

  it('explains every margin and shows the heat balance', async () => {
    const { lastFrame, stdin } = await detail();
    expect(lastFrame()).toContain('✓ pass — passes every limit');
    expect(lastFrame()).toContain('MARGINS');
    expect(lastFrame()).toMatch(/✓ VRRM\s+█+/);
    expect(lastFrame()).toContain('VRRM 100 V against 40.0 V needed');
    await pressUntil(stdin, lastFrame, KEY.pageDown, 'HEAT BALANCE AT 70.0 °C AMBIENT');
    expect(lastFrame()).toMatch(/Losses\s+conduction/);
  });

  it('charts junction temperature against ambient, marking the highest ambient', async () => {
    const { lastFrame, stdin } = await detail();
    await pressUntil(stdin, lastFrame, KEY.pageDown, 'JUNCTION TEMPERATURE AGAINST AMBIENT');
    await pressUntil(stdin, lastFrame, KEY.down, '70.0 °C max', 30);
    const frame = lastFrame();
    expect(frame).toContain('JUNCTION TEMPERATURE AGAINST AMBIENT');
    expect(frame).toMatch(/150 °C ┤/);
    expect(frame).toContain('┬');
    expect(frame).toContain('70.0 °C max');
    expect(widestLine(frame)).toBeLessThanOrEqual(80);
  });

  it('shows unknown values as such', async () => {
    const { lastFrame } = await detail(coilSession(), 'NOIFSM');
    expect(lastFrame()).toContain('? unknown');
    expect(lastFrame()).toMatch(/\? IFSM\s+\?/);
  });

  it('keeps the safety caution at the top', async () => {
    const { lastFrame } = await detail(mainsSession(), 'MAINS-1K');
    expect(lastFrame().split('\n')[1]).toContain('⚠ SAFETY');
    expect(lastFrame()).toContain('MAINS-1K');
  });
});
