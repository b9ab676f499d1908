import { describe, expect, it } from 'vitest';
import { approvalHistory, findPart } from '../../src/catalog/index.js';
import { EditPartScreen } from '../../src/tui/screens/edit-part-screen.js';
import { PartScreen } from '../../src/tui/screens/part-screen.js';
import { aPart } from '../helpers/a-part.js';
import { KEY, press, pressUntil, type, widestLine } from '../helpers/render-tui.js';
import { renderScreen } from './support/render-app.js';
import { testServices } from './support/tui-services.js';

const part = aPart('schottky', { ifsmA: 80, ifsmPulseS: 8.3e-3, description: 'SMA Schottky \u001b]0;pwned\u0007for \u001b[31mfreewheel', approval: 'approved' });
const other = aPart('schottky', { partNumber: 'TW-SK360A', vrrmV: 60 });

function open() {
  const services = testServices([part, other]);
  return { ...renderScreen(<EditPartScreen part={part} width={80} height={24} isActive />, services), services };
}

const focus = async (stdin: { write(d: string): void }, lastFrame: () => string, label: string) => pressUntil(stdin, lastFrame, KEY.down, `› ${label}`, 40);

describe('editing a part', () => {
  it('fills the form with every stored value in engineering notation, catalog text made safe', async () => {
    const { lastFrame, stdin } = open();
    expect(lastFrame()).toContain('Catalog › TW-SK340A › edit');
    expect(lastFrame()).toMatch(/Part number\s+\*\s+TW-SK340A/);
    expect(lastFrame()).toMatch(/Description\s+SMA Schottky for f…/);
    expect(lastFrame()).not.toContain('\u001b]0;');
    expect(lastFrame()).toMatch(/Approval\s+‹ approved ›/);
    await focus(stdin, lastFrame, 'IFSM pulse');
    expect(lastFrame()).toMatch(/VRRM\s+\*\s+40 V/);
    expect(lastFrame()).toMatch(/IFSM\s+80 A/);
    expect(lastFrame()).toMatch(/IFSM pulse\s+8.3 ms/);
    await focus(stdin, lastFrame, 'Tj max');
    expect(lastFrame()).toMatch(/VF\s+\*\s+500 mV @ 3 A @ 25 …/);
    expect(lastFrame()).toMatch(/Tj max\s+\*\s+150 °C/);
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
  });

  it('puts a bad value\'s error beside its field and saves nothing', async () => {
    const { lastFrame, stdin, services } = open();
    await focus(stdin, lastFrame, 'VRRM');
    await press(stdin, KEY.ctrlU);
    await type(stdin, '60 A');
    expect(lastFrame()).toMatch(/VRRM\s+\*\s+60 A▏\s+✗ .*voltage/);
    await press(stdin, KEY.enter);
    expect(lastFrame()).not.toContain('✓ Saved');
    expect(findPart(services.catalogDb, 'TW-SK340A').vrrmV).toBe(40);
  });

  it('refuses a maker and part number another part has, beside the part number', async () => {
    const { lastFrame, stdin, services } = open();
    await focus(stdin, lastFrame, 'Part number');
    await press(stdin, KEY.ctrlU);
    await type(stdin, 'tw-sk360a');
    expect(lastFrame()).toMatch(/Part number\s+\*\s+tw-sk360a▏\s+✗ already in the catalog/);
    await press(stdin, KEY.enter);
    expect(lastFrame().replace(/\s+/g, ' ')).toContain('✗ already in the catalog: Testwell Devices:tw-sk360a is another part. Expected a maker and part number no other part has');
    expect(lastFrame()).not.toContain('✓ Saved');
    expect(findPart(services.catalogDb, 'TW-SK360A').vrrmV).toBe(60);
    expect(findPart(services.catalogDb, 'TW-SK340A').vrrmV).toBe(40);
  });

  it('saves a changed rating in place, keeping the approval trail as it was', async () => {
    const { lastFrame, stdin, services, routes } = open();
    await focus(stdin, lastFrame, 'VRRM');
    await press(stdin, KEY.ctrlU);
    await type(stdin, '45 V');
    await press(stdin, KEY.enter);
    expect(lastFrame().replace(/\s+/g, ' ')).toContain('✓ Saved Testwell Devices:TW-SK340A: VRRM changed. Enter or Esc goes back to the part.');
    expect(findPart(services.catalogDb, 'TW-SK340A')).toMatchObject({ vrrmV: 45, ifsmPulseS: 8.3e-3, tjMaxK: 423.15 });
    expect(approvalHistory(services.catalogDb, part)).toHaveLength(1);
    await press(stdin, KEY.enter);
    expect(routes).toEqual(['back']);
  });

  it('records a change of approval in the trail', async () => {
    const { lastFrame, stdin, services } = open();
    await focus(stdin, lastFrame, 'Approval');
    await press(stdin, KEY.right);
    expect(lastFrame()).toMatch(/Approval\s+‹ conditional ›/);
    await press(stdin, KEY.down);
    await type(stdin, 'only below 60 °C ambient');
    await press(stdin, KEY.enter);
    expect(lastFrame().replace(/\s+/g, ' ')).toContain('Approval, Approval note changed; the approval change is in the trail');
    const trail = approvalHistory(services.catalogDb, part);
    expect(trail[trail.length - 1]).toMatchObject({ fromState: 'approved', toState: 'conditional', note: 'only below 60 °C ambient', by: 'tester', reason: 'edited in the terminal interface' });
  });

  it('says when nothing changed, and warns that a renamed part leaves its trail under the old name', async () => {
    const { lastFrame, stdin, services } = open();
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('Nothing changed: every field is as stored.');
    await focus(stdin, lastFrame, 'Part number');
    await type(stdin, 'X');
    expect(lastFrame()).not.toContain('Nothing changed');
    expect(lastFrame().replace(/\s+/g, ' ')).toContain('! New maker or part number: the approval trail so far stays filed under Testwell Devices:TW-SK340A.');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('✓ Saved Testwell Devices:TW-SK340AX');
    expect(services.catalog!.find(part)).toMatchObject({ partNumber: 'TW-SK340AX' });
  });

  it('opens from the part detail on e', async () => {
    const services = testServices([part]);
    const { stdin, routes, lastFrame } = renderScreen(<PartScreen part={part} width={80} height={24} isActive />, services);
    expect(lastFrame()).toMatch(/e edit · p approval · r replace/);
    await press(stdin, 'e');
    expect(routes).toEqual([{ name: 'edit-part', part: expect.objectContaining({ partNumber: 'TW-SK340A' }) }]);
  });
});
