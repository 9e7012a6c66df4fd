// @vitest-environment happy-dom
/** Placement edits: snapping, placing from a template, nudging, rotating, deleting, free spot, scenario edits. */
import { describe, expect, test } from 'vitest';
import { checkLayout } from '@shared/layout/rules';
import { defaultTemplates } from '@/components/canvas/defaultTemplates';
import { deleteParts, nudgeParts, placePart, rotateParts, snapTo, withPositions } from '@/components/canvas/edits';
import { freeSpot } from '@/components/canvas/freeSpot';
import { partsInBox } from '@/components/canvas/boxSelect';
import { zoomIdentity } from 'd3';
import { addScenario, removeScenario, totalPower } from '@/components/loads/loadEdits';
import { expectClose } from '../helpers/float';
import { testModel } from './helpers/demoModel';

describe('placement edits', () => {
  test('snapTo rounds to the grid and keeps the numbers tidy', () => {
    expectClose(snapTo(0.01234, 1e-4), 0.0123, 1e-12, 0, 'snapped to 0.1 mm');
    expect(snapTo(0.0123456, 1e-4)).toBe(0.0123); // exact after the 1 nm clean-up
    expectClose(snapTo(0.0126, 5e-4), 0.0125, 1e-12, 0, 'snapped to 0.5 mm');
  });

  test('a placed memory stack gets a free id, a snapped centre and zero loads with one entry per tier', () => {
    const m = testModel();
    const id = placePart(m, defaultTemplates.memory, { x: 0.02004, y: 0.00996 });
    expect(id).toBe('mem1');
    const p = m.parts.at(-1)!;
    expect([p.x, p.y]).toEqual([0.02, 0.01]);
    expect(m.scenarios.map((s) => s.loads[id])).toEqual([{ power: 0, tiers: Array(8).fill(0) }, { power: 0, tiers: Array(8).fill(0) }]);
  });

  test('nudge, rotate and delete act on the chosen parts only', () => {
    const m = testModel();
    nudgeParts(m, ['mem0'], 0.001, -0.0001);
    expect([m.parts[1].x, m.parts[1].y]).toEqual([0.033, 0.0169]);
    rotateParts(m, ['cpu0']);
    rotateParts(m, ['cpu0']);
    expect(m.parts.map((p) => p.rotation)).toEqual([180, 0]);
    deleteParts(m, ['cpu0']);
    expect(m.parts.map((p) => p.id)).toEqual(['mem0']);
    expect(Object.keys(m.scenarios[0].loads)).toEqual(['mem0']);
  });

  test('withPositions returns a new model and leaves the old one alone (drag preview)', () => {
    const m = testModel();
    const n = withPositions(m, { cpu0: { x: 0.01, y: 0.01 } });
    expect(n.parts[0].x).toBe(0.01);
    expect(m.parts[0].x).toBe(0.012);
    expect(n.parts[1]).toBe(m.parts[1]);
  });

  test('the free spot for a new part breaks no rule', () => {
    const m = testModel();
    const at = freeSpot(m, defaultTemplates.io);
    placePart(m, defaultTemplates.io, at);
    expect(checkLayout(m)).toEqual([]);
  });
});

describe('box selection', () => {
  test('parts meeting the box are added to the current selection', () => {
    const m = testModel();
    const t = zoomIdentity.translate(10, 10).scale(2); // 2 px per mm; world y is down from the top edge (34 mm)
    // screen (10 + 2·x_mm, 10 + 2·(34 − y_mm)): a box over x 20–30 mm, y 10–20 mm meets only the memory (26.5–37.5 mm)
    expect(partsInBox(m, t, [50, 38], [70, 58])).toEqual(['mem0']);
    expect(partsInBox(m, t, [50, 38], [70, 58], ['cpu0'])).toEqual(['cpu0', 'mem0']);
    expect(partsInBox(m, t, [10, 10], [12, 12])).toEqual([]);
  });
});

describe('scenario edits', () => {
  test('adding copies the loads under a fresh id; removing never drops the last scenario', () => {
    const m = testModel();
    const id = addScenario(m, 'boost', m.scenarios[1]);
    expect(id).toBe('boost-2');
    expectClose(totalPower(m.scenarios[2].loads.mem0), 5.4, 1e-12, 0, 'copied memory total 3 + 4 × 0.6 W (arithmetic)');
    removeScenario(m, 'idle');
    removeScenario(m, 'boost');
    removeScenario(m, 'boost-2');
    expect(m.scenarios.map((s) => s.id)).toEqual(['boost-2']);
  });
});
