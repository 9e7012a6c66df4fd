// @vitest-environment happy-dom
/** Loads table: parts × scenarios, tier rows, totals, edits into the store, power-map CSV errors with line and column. */
import { beforeEach, describe, expect, test } from 'vitest';
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import LoadsTable from '@/components/loads/LoadsTable.vue';
import { useVariantStore } from '@/stores/variant';
import { expectClose } from '../helpers/float';
import { testVariant } from './helpers/demoModel';

let store: ReturnType<typeof useVariantStore>;
beforeEach(() => {
  setActivePinia(createPinia());
  store = useVariantStore();
  store.adopt(testVariant());
});

const mountTable = (readonly = false) => mount(LoadsTable, { props: { readonly }, attachTo: document.body });

async function upload(w: ReturnType<typeof mountTable>, name: string, text: string): Promise<void> {
  const input = w.find('[data-test="power-map-file"]');
  Object.defineProperty(input.element, 'files', { value: [new File([text], name, { type: 'text/csv' })], configurable: true });
  await input.trigger('change');
  await flushPromises();
}

describe('LoadsTable', () => {
  test('one row per part, one column per scenario, totals add base die and tiers', () => {
    const w = mountTable();
    expect(w.findAll('tbody tr[data-test^="load-row-"]')).toHaveLength(2);
    expect(w.findAll('thead th.scn')).toHaveLength(2);
    // arithmetic: 160 + 3 + 4 × 0.6 = 165.4 W
    expect(w.find('[data-test="total-boost"]').text()).toBe('165 W');
    expect(w.find('[data-test="total-idle"]').text()).toBe('36.8 W'); // 35 + 1 + 4 × 0.2
  });

  test('opening a memory stack shows one row per DRAM tier; editing a tier updates the model', async () => {
    const w = mountTable();
    await w.find('[data-test="tiers-mem0"]').trigger('click');
    expect(w.findAll('tr.tier')).toHaveLength(4);
    const input = w.find('[data-test="tier-mem0-2-boost"] input');
    await input.setValue('1.5');
    await input.trigger('blur');
    expectClose(store.model!.scenarios[1].loads.mem0.tiers![1], 1.5, 1e-12, 0, 'tier 2 boost power (typed in)');
    expect(store.canUndo).toBe(true);
  });

  test('a malformed power-map CSV is rejected with its line and column, a good one is previewed and stored', async () => {
    const w = mountTable();
    await w.find('[data-test="power-cpu0-boost-map"]').trigger('click');
    await upload(w, 'bad.csv', '1,1,1\n1,1,hot\n1,1,1\n');
    expect(w.find('[data-test="csv-error"]').text()).toContain('Line 2, column 3');
    expect(store.model!.scenarios[1].loads.cpu0.map).toBeUndefined();

    await upload(w, 'good.csv', '0,1\n2,3\n');
    expect(w.find('[data-test="csv-error"]').exists()).toBe(false);
    expect(store.model!.scenarios[1].loads.cpu0.map).toEqual({ nx: 2, ny: 2, weights: [2, 3, 0, 1] });
    expect(w.find('[data-test="power-map-preview"]').exists()).toBe(true);
  });

  test('read-only: inputs are disabled and there is no upload', async () => {
    const w = mountTable(true);
    expect(w.find('[data-test="power-cpu0-boost"] input').attributes('disabled')).toBeDefined();
    expect(w.find('[data-test="power-cpu0-boost-map"]').exists()).toBe(false);
  });
});
