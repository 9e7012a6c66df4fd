// @vitest-environment happy-dom
/** Canvas rule display: broken rules mark the parts (outline + hatching), the overlap area and the rule list. */
import { beforeEach, describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { checkLayout } from '@shared/layout/rules';
import type { Model } from '@shared/schemas/model';
import LayoutCanvas from '@/components/canvas/LayoutCanvas.vue';
import RuleList from '@/components/canvas/RuleList.vue';
import { expectClose } from '../helpers/float';
import { testModel } from './helpers/demoModel';

beforeEach(() => setActivePinia(createPinia()));

function moved(x: number, y = 0.017): Model {
  const m = testModel();
  m.parts[1].x = x;
  m.parts[1].y = y;
  return m;
}
const mountCanvas = (model: Model, readonly = false) =>
  mount(LayoutCanvas, { props: { model, selection: [], violations: checkLayout(model), readonly } });

describe('LayoutCanvas rule marks', () => {
  test('a clean layout has no marks', () => {
    const w = mountCanvas(testModel());
    expect(w.find('[data-test="part-cpu0"]').attributes('data-rule')).toBeUndefined();
    expect(w.findAll('[data-test^="rule-mark-"]')).toHaveLength(0);
  });

  test('overlapping parts are both hatched as errors and the shared area is drawn', () => {
    // compute spans x 5.5–18.5 mm; memory centred at 20 mm spans 14.5–25.5 mm: 4 mm overlap
    const w = mountCanvas(moved(0.02));
    for (const id of ['cpu0', 'mem0']) {
      expect(w.find(`[data-test="part-${id}"]`).attributes('data-rule')).toBe('error');
      expect(w.find(`[data-test="rule-mark-${id}"]`).exists()).toBe(true);
    }
    const area = w.find('[data-test="overlap-area"]');
    expectClose(Number(area.attributes('width')), 4, 1e-9, 1e-9, 'overlap width, mm (arithmetic)');
    expectClose(Number(area.attributes('height')), 10, 1e-9, 1e-9, 'overlap height, mm (memory height)');
  });

  test('a gap under the minimum is a warning, a part past the edge an error on that part only', () => {
    // memory left edge at 18.6 mm: 0.1 mm from the compute's right edge < 0.2 mm minimum (common practice)
    const gap = mountCanvas(moved(0.0241));
    expect(gap.find('[data-test="part-mem0"]').attributes('data-rule')).toBe('warn');
    const out = mountCanvas(moved(0.043));
    expect(out.find('[data-test="part-mem0"]').attributes('data-rule')).toBe('error');
    expect(out.find('[data-test="part-cpu0"]').attributes('data-rule')).toBeUndefined();
  });

  test('parts carry their centre in mm; read-only parts are not movable', () => {
    const w = mountCanvas(testModel(), true);
    const part = w.find('[data-test="part-mem0"]');
    expect(part.attributes('data-x-mm')).toBe('32.000');
    expect(part.classes()).not.toContain('movable');
    expect(mountCanvas(testModel()).find('[data-test="part-mem0"]').classes()).toContain('movable');
  });

  test('clicking a part selects it, shift-click adds it', async () => {
    const w = mountCanvas(testModel());
    await w.find('[data-test="part-cpu0"]').trigger('click');
    await w.setProps({ selection: ['cpu0'] });
    await w.find('[data-test="part-mem0"]').trigger('click', { shiftKey: true });
    expect(w.emitted('update:selection')).toEqual([[['cpu0']], [['cpu0', 'mem0']]]);
  });
});

describe('RuleList', () => {
  test('lists each broken rule and selects its parts on click', async () => {
    const violations = checkLayout(moved(0.02));
    const w = mount(RuleList, { props: { violations } });
    expect(w.find('[data-test="rule-overlap"]').text()).toContain('Compute 0 overlaps Memory 0');
    await w.find('[data-test="rule-overlap"]').trigger('click');
    expect(w.emitted('select')).toEqual([[['cpu0', 'mem0']]]);
    expect(mount(RuleList, { props: { violations: [] } }).find('[data-test="rules-ok"]').exists()).toBe(true);
  });
});
