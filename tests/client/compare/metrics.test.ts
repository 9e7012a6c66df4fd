// @vitest-environment happy-dom
/** Compare table: figures per variant, best value per row (ties, unranked rows), differences to the baseline. */
import { describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import CompareMetrics from '@/components/compare/CompareMetrics.vue';
import { bestColumns, compareMetrics, deltaTo, type MetricRow } from '@/components/compare/metrics';
import { expectClose } from '../../helpers/float';
import { fakePart, fakeResult } from './fakeResult';

// Invented figures: A runs hotter, B has the coolest hot spot, C the coolest DRAM tier.
const A = fakeResult([fakePart('c', 112, 105), fakePart('m', 90, 85, [80, 78])], [[0, 4], [12, 0]], 200, 196);
const B = fakeResult([fakePart('c', 101, 105), fakePart('m', 88, 85, [79, 77])], [[0, 3], [9, 0]], 200, 196);
const C = fakeResult([fakePart('c', 104, 105), fakePart('m', 84, 85, [76, 75])], [[0, 2], [15, 0]], 200, 190);
const rows = compareMetrics([A, B, C]);
const row = (key: string) => rows.find((r) => r.key === key)!;

describe('compareMetrics', () => {
  test('hottest part, hottest tier, smallest margin, largest coupling term and heat split per variant', () => {
    expect(row('hottest').cells.map((c) => c.value)).toEqual([112, 101, 104]);
    expect(row('tier').cells.map((c) => c.detail)).toEqual(['Part m, tier 1', 'Part m, tier 1', 'Part m, tier 1']);
    // margins: limit − hottest of hot spot and tiers (arithmetic): A min(105−112, 85−90) = −7
    expect(row('margin').cells.map((c) => c.value)).toEqual([-7, -3, 1]);
    expect(row('over').cells.map((c) => c.value)).toEqual([2, 1, 0]);
    expect(row('coupling').cells.map((c) => c.detail)).toEqual(['Part c → Part m', 'Part c → Part m', 'Part c → Part m']);
    expectClose(row('split').cells[2].value!, 95, 1e-12, 0, 'C heat to lid, % (190 of 200 W, arithmetic)');
  });

  test('the time row stays empty without a transient', () => {
    expect(row('time').cells.every((c) => c.value === null && c.text === '—')).toBe(true);
  });
});

describe('best values', () => {
  test('lower is better for temperatures, higher for margins; unranked and all-equal rows mark nothing', () => {
    expect(bestColumns(row('hottest'))).toEqual([1]);
    expect(bestColumns(row('tier'))).toEqual([2]);
    expect(bestColumns(row('margin'))).toEqual([2]);
    expect(bestColumns(row('power'))).toEqual([]); // all 200 W
    expect(bestColumns(row('split'))).toEqual([]); // not ranked
  });

  test('ties share the mark, missing values are skipped', () => {
    const r: MetricRow = { key: 'x', label: 'x', unit: 'K', better: 'lower', cells: [{ value: 3, text: '' }, { value: 3, text: '' }, { value: 5, text: '' }, { value: null, text: '—' }] };
    expect(bestColumns(r)).toEqual([0, 1]);
  });

  test('the table marks exactly the best cell of each ranked row', () => {
    const w = mount(CompareMetrics, { props: { rows, names: ['A', 'B', 'C'], baseline: 0 } });
    const marked = (key: string) => w.find(`[data-test="row-${key}"]`).findAll('td').map((td) => td.attributes('data-best') === 'yes');
    expect(marked('hottest')).toEqual([false, true, false]);
    expect(marked('margin')).toEqual([false, false, true]);
    expect(marked('power')).toEqual([false, false, false]);
    expect(w.findAll('.best-mark')).toHaveLength(w.findAll('[data-best="yes"]').length);
  });
});

describe('differences to the baseline', () => {
  test('signed differences with better/worse by the row direction', () => {
    expect(deltaTo(row('hottest'), 1, 0)).toEqual({ text: '-11.0 K', tone: 'better' }); // 101 − 112
    expect(deltaTo(row('margin'), 0, 2)).toEqual({ text: '-8.0 K', tone: 'worse' }); // −7 − 1
    expect(deltaTo(row('hottest'), 0, 0)).toBeNull();
  });

  test('the table shows them beside each non-baseline cell', () => {
    const w = mount(CompareMetrics, { props: { rows, names: ['A', 'B', 'C'], baseline: 1 } });
    const deltas = w.find('[data-test="row-hottest"]').findAll('td').map((td) => td.find('.delta').exists() ? td.find('.delta').text() : null);
    expect(deltas).toEqual(['+11.0 K', null, '+3.0 K']);
  });
});
