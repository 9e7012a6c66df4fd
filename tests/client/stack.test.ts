// @vitest-environment happy-dom
/** Stack screen: sink resistance → h, cross-section geometry (minimum visible height, true labels), layer field messages. */
import { beforeEach, describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import LayerTable from '@/components/stack/LayerTable.vue';
import { defaultSinkArea, hFromSink, sinkCooling } from '@/components/stack/cooling';
import { crossSection, SECTION } from '@/components/stack/crossSection';
import { useVariantStore } from '@/stores/variant';
import { expectClose } from '../helpers/float';
import { testModel, testVariant } from './helpers/demoModel';

beforeEach(() => setActivePinia(createPinia()));

describe('cooling conversion', () => {
  test('h = 1/(R·A): 0.1 K/W over the 52 × 40 mm lid is about 4,808 W/m²K', () => {
    const m = testModel();
    const A = defaultSinkArea(m, 'top');
    expectClose(A, 0.052 * 0.04, 1e-12, 0, 'lid top area, m² (product.md demo lid)');
    expectClose(hFromSink(0.1, A), 1 / (0.1 * 0.00208), 1e-12, 0, 'h from R (arithmetic)');
    const c = sinkCooling(m, 'top', m.stack.cooling.top, 0.1);
    expect(c.sinkArea).toBeUndefined();
    const b = sinkCooling(m, 'bottom', m.stack.cooling.bottom, 2);
    expectClose(b.sinkArea!, 0.06 * 0.052, 1e-12, 0, 'board side keeps the substrate area explicit');
    expectClose(b.h, 1 / (2 * 0.00312), 1e-12, 0, 'board-side h (arithmetic)');
  });
});

describe('crossSection', () => {
  test('thin layers get the minimum height and keep their true thickness in the label', () => {
    const m = testModel();
    const s = crossSection(m, ['mem0']);
    const bumps = s.rects.find((r) => r.key === 'mem0.0')!; // 40 µm of a ≈ 4.2 mm tall drawing 222 px high: ≈ 2 px
    expect(bumps.thin).toBe(true);
    expectClose(bumps.h, SECTION.minPx, 1e-12, 0, 'minimum visible height, px');
    expect(s.labels.find((l) => l.key === 'mem0.0')!.text).toBe('Memory 0 bumps · 40 µm');
    const tiers = s.rects.find((r) => r.key === 'mem0.2')!;
    expect(tiers.stripes).toBe(4);
    expect(s.labels.find((l) => l.key === 'mem0.2')!.text).toContain('4 DRAM tiers (50 µm + 20 µm bond each) · 280 µm');
  });

  test('the cut goes through the selected part and finds the parts it crosses; the lid sits on the tallest column', () => {
    const s = crossSection(testModel(), ['cpu0']);
    expectClose(s.yCut, 0.017, 1e-12, 0, 'cut at the compute centre y');
    expect(s.cut.map((p) => p.id)).toEqual(['cpu0', 'mem0']);
    const lid = s.rects.find((r) => r.key === 'lid0')!;
    const tops = s.rects.filter((r) => r.key.startsWith('cpu0.') || r.key.startsWith('mem0.')).map((r) => r.y);
    expectClose(lid.y + lid.h, Math.min(...tops), 1e-9, 1e-9, 'lid underside on the highest part top, px');
    const labelYs = s.labels.map((l) => l.y).sort((a, b) => a - b);
    for (let i = 1; i < labelYs.length; i++) expect(labelYs[i] - labelYs[i - 1]).toBeGreaterThanOrEqual(SECTION.labelGap - 1e-9);
  });
});

describe('LayerTable', () => {
  test('a value outside the schema shows a field message in display units and is not stored', async () => {
    const store = useVariantStore();
    store.adopt(testVariant());
    const w = mount(LayerTable, { props: { readonly: false }, attachTo: document.body });
    const input = w.find('[data-test="layer-lid.0-thickness"] input');
    await input.setValue('60000');
    await input.trigger('blur');
    expect(w.find('[data-test="error-lid.0-thickness"]').text()).toBe('at most 50000 µm');
    expectClose(store.model!.stack.lid.layers[0].thickness, 2e-3, 1e-12, 0, 'lid thickness unchanged');
    await input.setValue('1500');
    await input.trigger('blur');
    expect(w.find('[data-test="error-lid.0-thickness"]').exists()).toBe(false);
    expectClose(store.model!.stack.lid.layers[0].thickness, 1.5e-3, 1e-12, 0, 'lid thickness 1500 µm stored in m');
  });

  test('selecting a part adds its die, TIM1 and bump rows; edits apply to every selected part', async () => {
    const store = useVariantStore();
    store.adopt(testVariant());
    store.selection = ['cpu0', 'mem0'];
    const w = mount(LayerTable, { props: { readonly: false }, attachTo: document.body });
    expect(w.find('[data-test="layer-part.tim1"]').exists()).toBe(true);
    const input = w.find('[data-test="layer-part.tim1-kz"] input');
    await input.setValue('6');
    await input.trigger('blur');
    expect(store.model!.parts.map((p) => p.tim1?.kz)).toEqual([6, 6]);
  });
});
