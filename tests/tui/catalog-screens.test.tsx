import { describe, expect, it } from 'vitest';
import { approvalHistory, findPart } from '../../src/catalog/index.js';
import { AddPartScreen } from '../../src/tui/screens/add-part-screen.js';
import { ApprovalScreen } from '../../src/tui/screens/approval-screen.js';
import { PartScreen } from '../../src/tui/screens/part-screen.js';
import { aPart } from '../helpers/a-part.js';
import { renderScreen } from './support/render-app.js';
import { KEY, press, pressUntil, type, widestLine } from '../helpers/render-tui.js';
import { testServices } from './support/tui-services.js';

describe('adding a part', () => {
  const open = () => {
    const services = testServices([aPart('schottky')]);
    return { ...renderScreen(<AddPartScreen width={80} height={24} isActive />, services), services };
  };

  it('asks for the fields of the kind, and changes them with the kind', async () => {
    const { lastFrame, stdin } = open();
    expect(lastFrame()).toMatch(/Kind\s+\*\s+‹ rectifier ›/);
    expect(lastFrame()).toMatch(/Manufacturer\s+\*\s+required/);
    for (let i = 0; i < 5; i++) await press(stdin, KEY.right);
    expect(lastFrame()).toMatch(/Kind\s+\*\s+‹ zener ›/);
    await pressUntil(stdin, lastFrame, KEY.down, 'VZ tolerance', 20);
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
  });

  it('puts each error beside its field as typed, and every missing one on Enter', async () => {
    const { lastFrame, stdin } = open();
    await pressUntil(stdin, lastFrame, KEY.down, '› VRRM', 20);
    await type(stdin, '40 A');
    expect(lastFrame()).toMatch(/40 A▏\s+✗ .*voltage/);
    await press(stdin, KEY.enter);
    expect(lastFrame()).toMatch(/› Manufacturer\s+\*\s+▏required\s+✗/);
  });

  it('saves a valid part to the catalog with °C for bare temperatures', async () => {
    const { lastFrame, stdin, services } = open();
    const fill = async (field: string, text: string) => {
      await pressUntil(stdin, lastFrame, KEY.down, `› ${field}`, 30);
      await type(stdin, text);
    };
    await fill('Manufacturer', 'Testwell Devices');
    await fill('Part number', 'TW-NEW-1');
    await fill('Package', 'SMB');
    await fill('VRRM', '200 V');
    await fill('IF(AV)', '2 A');
    await fill('VF', '0.9 V @ 2 A @ 25');
    await fill('Tj max', '175');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('✓ Saved Testwell Devices:TW-NEW-1 to the catalog');
    expect(findPart(services.catalogDb, 'TW-NEW-1')).toMatchObject({ vrrmV: 200, tjMaxK: 448.15, approval: 'pending' });
  });

  it('refuses a part that is already in the catalog', async () => {
    const { lastFrame, stdin } = open();
    const fill = async (field: string, text: string) => {
      await pressUntil(stdin, lastFrame, KEY.down, `› ${field}`, 30);
      await type(stdin, text);
    };
    await fill('Manufacturer', 'Testwell Devices');
    await fill('Part number', 'TW-SK340A');
    await fill('Package', 'SMA');
    await fill('VRRM', '40 V');
    await fill('IF(AV)', '3 A');
    await fill('VF', '0.5 V @ 3 A @ 25');
    await fill('Tj max', '150');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('already in the catalog');
  });
});

describe('approval', () => {
  const part = aPart('schottky', { approval: 'pending' });

  it('needs the condition of a conditional approval and a reason', async () => {
    const services = testServices([part]);
    const { lastFrame, stdin } = renderScreen(<ApprovalScreen part={part} width={80} height={24} isActive />, services);
    expect(lastFrame()).toMatch(/New state\s+\*\s+‹ pending ›/);
    await press(stdin, KEY.left);
    expect(lastFrame()).toMatch(/‹ conditional ›/);
    expect(lastFrame()).toContain('Condition');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toMatch(/Condition\s+\*.*✗ a conditional/);
    expect(lastFrame()).toMatch(/Reason\s+\*.*✗ required/);
    await press(stdin, KEY.down);
    expect(lastFrame()).toContain('✗ a conditional approval needs its condition, e.g. "only below 60 °C ambient"');
  });

  it('records the change with its reason and shows it in the trail', async () => {
    const services = testServices([part]);
    const { lastFrame, stdin } = renderScreen(<ApprovalScreen part={part} width={80} height={24} isActive />, services);
    await press(stdin, KEY.left, KEY.down);
    await type(stdin, 'only below 60 °C ambient');
    await press(stdin, KEY.down);
    await type(stdin, 'thermal test report 12');
    await press(stdin, KEY.enter);
    expect(lastFrame().replace(/\s+/g, ' ')).toContain('✓ TW-SK340A is now conditional (only below 60 °C ambient), recorded as changed by tester.');
    expect(lastFrame()).toContain('pending → conditional');
    const trail = approvalHistory(services.catalogDb, part);
    expect(trail[trail.length - 1]).toMatchObject({ toState: 'conditional', note: 'only below 60 °C ambient', reason: 'thermal test report 12', by: 'tester' });
  });

  it('shows every rating of a part and its trail, and goes to the approval form on p', async () => {
    const services = testServices([part]);
    const { lastFrame, stdin, routes } = renderScreen(<PartScreen part={part} width={80} height={24} isActive />, services);
    expect(lastFrame()).toContain('Testwell Devices TW-SK340A');
    expect(lastFrame()).toMatch(/VF\s+500 mV at 3.00 A, Tj 25.0 °C/);
    expect(lastFrame()).toContain('APPROVAL TRAIL (1)');
    await press(stdin, 'p');
    expect(routes).toEqual([{ name: 'approval', part: expect.objectContaining({ partNumber: 'TW-SK340A' }) }]);
  });
});
