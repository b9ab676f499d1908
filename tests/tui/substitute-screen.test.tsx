import { describe, expect, it } from 'vitest';
import { CandidateScreen } from '../../src/tui/screens/candidate-screen.js';
import { SubstituteScreen } from '../../src/tui/screens/substitute-screen.js';
import type { Part } from '../../src/parts/index.js';
import { aPart } from '../helpers/a-part.js';
import { KEY, press, pressUntil, type, widestLine } from '../helpers/render-tui.js';
import { renderScreen } from './support/render-app.js';
import { coilParts, coilSession } from './support/tui-fixtures.js';
import { testServices } from './support/tui-services.js';

const OTHER = 'Oristane Devices';
const original = aPart('schottky', { ifsmA: 80, secondSourceGroup: 'SK3A40' });
const twin = aPart('schottky', { manufacturer: OTHER, partNumber: 'ODK-340A', ifsmA: 80, secondSourceGroup: 'SK3A40' });
const higherVf = aPart('schottky', { manufacturer: OTHER, partNumber: 'ODK-360A', vrrmV: 60, ifsmA: 100, vfPoints: [{ vfV: 0.55, ifA: 3, tjK: 298.15 }] });
const noSurge = aPart('schottky', { manufacturer: OTHER, partNumber: 'ODK-340N' });
const otherPackage = aPart('schottky', { manufacturer: OTHER, partNumber: 'ODK-340B', package: 'SMB', ifsmA: 80 });
const parts = [original, twin, higherVf, noSurge, otherPackage];

function open(orig: Part | null, alt: Part | null, columns = 80, all: readonly Part[] = parts) {
  const services = testServices(all);
  return renderScreen(<SubstituteScreen original={orig} alternate={alt} width={columns} height={24} isActive />, services, { columns });
}

describe('the substitution screen', () => {
  it('with no alternate chosen yet, lists the ranked replacements, second sources first', () => {
    const { lastFrame } = open(original, null);
    expect(lastFrame()).toMatch(/Original\s+Testwell Devices TW-SK340A · SMA · schottky/);
    expect(lastFrame()).toMatch(/Alternate\s+none chosen yet — choose it below/);
    expect(lastFrame()).toContain('ranked replacements of the original (3)');
    expect(lastFrame()).toMatch(/› 1\s+✓ ODK-340A\s+pending\s+drop-in, second source \(SK3A40\)/);
    // A different package never sits on the footprint: not offered as a replacement.
    expect(lastFrame()).not.toContain('ODK-340B');
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
  });

  it('shows a drop-in: verdict, reason and every rating marked', async () => {
    const { lastFrame, stdin } = open(original, null);
    await press(stdin, KEY.enter);
    expect(lastFrame()).toMatch(/Alternate\s+Oristane Devices ODK-340A/);
    expect(lastFrame()).toContain('✓ DROP-IN  ratings: 5 same');
    expect(lastFrame()).toContain('• equal or better in every rating both datasheets give');
    expect(lastFrame()).toMatch(/~ VRRM\s+40.0 V\s+40.0 V\s+same/);
    expect(lastFrame()).toMatch(/✓ same package, SMA/);
  });

  it('shows a part that is not a drop-in, with its reasons and direction-aware marks', () => {
    const { lastFrame } = open(original, higherVf);
    expect(lastFrame()).toContain('✗ NOT A DROP-IN  ratings: 2 better · 2 same · 1 worse');
    expect(lastFrame()).toMatch(/• worse in VF: without a design position that is not a safe drop-in/);
    expect(lastFrame()).toMatch(/✓ VRRM\s+40.0 V\s+60.0 V\s+better/);
    expect(lastFrame()).toMatch(/✗ VF\s+500 mV\s+550 mV\s+worse\s+at 3.00 A, Tj 25.0 °C/);
  });

  it('shows a value the catalog lacks as unknown, and says the parts cannot be compared on it', () => {
    const { lastFrame } = open(original, noSurge);
    expect(lastFrame()).toContain('✗ NOT A DROP-IN');
    expect(lastFrame()).toContain('not comparable for lack of data: IFSM');
    expect(lastFrame()).toMatch(/\? IFSM\s+80.0 A\s+unknown\s+unknown/);
  });

  it('gives the reason a different package rules a part out, chosen from the whole catalog', async () => {
    const { lastFrame, stdin } = open(original, null);
    await press(stdin, KEY.tab);
    expect(lastFrame()).toContain('Choose the alternate · whole catalog');
    await press(stdin, '/');
    await type(stdin, 'smb');
    await press(stdin, KEY.enter, KEY.enter);
    expect(lastFrame()).toContain('✗ NOT A DROP-IN');
    expect(lastFrame()).toMatch(/✗ different package: SMA against SMB/);
  });

  it('refuses the original as its own alternate', async () => {
    const { lastFrame, stdin } = open(original, null);
    await press(stdin, KEY.tab, '/');
    await type(stdin, 'tw-sk340a');
    await press(stdin, KEY.enter, KEY.enter);
    expect(lastFrame()).toContain('! That is the original itself; choose another part.');
    expect(lastFrame()).toMatch(/Alternate\s+none chosen yet/);
  });

  it('asks a Zener voltage to match: equal is ✓ matches, another value ✗ differs', () => {
    const zener = aPart('zener');
    const same = aPart('zener', { manufacturer: OTHER, partNumber: 'ODZ-5V1', zztOhm: 60 });
    const other = aPart('zener', { manufacturer: OTHER, partNumber: 'ODZ-6V2', vzV: 6.2 });
    expect(open(zener, same, 80, [zener, same]).lastFrame()).toMatch(/✓ VZ\s+5.10 V\s+5.10 V\s+matches/);
    const frame = open(zener, other, 80, [zener, other]).lastFrame();
    expect(frame).toContain('✗ NOT A DROP-IN  ratings: 3 same · 1 differs');
    expect(frame).toMatch(/✗ VZ\s+5.10 V\s+6.20 V\s+differs/);
    expect(frame).toContain('• VZ must match and does not');
  });

  it('exchanges original and alternate on x', async () => {
    const { lastFrame, stdin } = open(original, higherVf);
    await press(stdin, 'x');
    expect(lastFrame()).toMatch(/Original\s+Oristane Devices ODK-360A/);
    expect(lastFrame()).toMatch(/✗ VRRM\s+60.0 V\s+40.0 V\s+worse/);
  });

  it('keeps very long names within 80 columns, and uses two columns on a wide terminal', () => {
    const long = aPart('schottky', { manufacturer: 'Oristane Devices International Discrete Semiconductor Group', partNumber: 'ODK-340A-EXTENDED-TEMPERATURE-AUTOMOTIVE-GRADE-REEL-7IN', ifsmA: 80 });
    const narrow = open(original, long, 80, [original, long]).lastFrame();
    expect(widestLine(narrow)).toBeLessThanOrEqual(80);
    expect(narrow).toMatch(/Alternate\s+Oristane Devices International Discrete Semiconductor Group ODK-\S*…\n/);
    expect(narrow).toContain('✓ DROP-IN');
    const wide = open(original, long, 170, [original, long]).lastFrame();
    expect(widestLine(wide)).toBeLessThanOrEqual(170);
    expect(wide).toMatch(/WHY IT FITS\s+PACKAGE AND KIND/);
  });

  it('judges both parts at a position: margins side by side and the verdict at the position', async () => {
    const services = testServices(coilParts);
    const { lastFrame, stdin } = renderScreen(
      <SubstituteScreen original={coilParts[0]!} alternate={coilParts[1]!} session={coilSession()} width={80} height={24} isActive />,
      services,
    );
    expect(lastFrame()).toContain('✗ NOT A DROP-IN at this position');
    expect(lastFrame()).toMatch(/• the alternate is marginal at the position: marginal on VRRM/);
    await pressUntil(stdin, lastFrame, KEY.pageDown, 'IN THE CIRCUIT AT NEW POSITION');
    expect(lastFrame()).toMatch(/VRRM\s+✓ [█▊·]+\s+60 %\s+! ·+\s+−14 %/);
    expect(lastFrame()).toMatch(/Alternate ! marginal/);
  });

  it('opens from a candidate of a position: the part there now is the original, the candidate the alternate', async () => {
    const solved = coilSession();
    const session = { ...solved, draft: { ...solved.draft, origin: { path: 'relay.yaml', ref: 'K1-D', designName: 'Relay board', part: 'Testwell Devices:LOWV' } } };
    const services = testServices(coilParts);
    if (!session.result.ok) throw new Error('the fixture position should solve');
    const search = await services.catalog!.candidates(session.result.position, session.policy);
    const candidate = search.ranking.candidates.find((c) => c.evaluation.part.partNumber === 'GOOD-1')!;
    const { stdin, routes, lastFrame } = renderScreen(<CandidateScreen session={session} candidate={candidate} width={80} height={24} isActive />, services);
    expect(lastFrame()).toContain('r replace');
    await press(stdin, 'r');
    expect(routes).toEqual([{ name: 'substitute', original: expect.objectContaining({ partNumber: 'LOWV' }), alternate: expect.objectContaining({ partNumber: 'GOOD-1' }), session }]);
  });

  it('from a position without a part, asks for the original first', () => {
    const services = testServices(coilParts);
    const { lastFrame } = renderScreen(<SubstituteScreen original={null} alternate={coilParts[0]!} session={coilSession()} width={80} height={24} isActive />, services);
    expect(lastFrame()).toMatch(/Original\s+none chosen yet — choose it below/);
    expect(lastFrame()).toContain('The position has no part yet');
    expect(lastFrame()).toContain('Choose the original: the part to be replaced');
  });
});
