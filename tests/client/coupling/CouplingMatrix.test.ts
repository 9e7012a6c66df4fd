// @vitest-environment happy-dom
/** The matrix table: view modes, sorting by a column, highlighting the selected part, folding tiers. */
import { describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import CouplingMatrix from '@/components/coupling/CouplingMatrix.vue';
import { smallResult } from './fixture';

const cells = (w: ReturnType<typeof mount>, key: string) => w.get(`[data-test="row-${key}"]`).findAll('td').map((td) => td.text());
const order = (w: ReturnType<typeof mount>) => w.findAll('tbody tr').map((tr) => tr.attributes('data-test'));

describe('CouplingMatrix', () => {
  test('shows K/W, % of self and K views (values from the fixture)', async () => {
    const w = mount(CouplingMatrix, { props: { result: smallResult(), mode: 'resistance' } });
    expect(cells(w, 'io')).toEqual(['0.050', '0.800', '0.200']);
    await w.setProps({ mode: 'percent' });
    expect(cells(w, 'io')).toEqual(['6.3', '100.0', '25.0']);
    await w.setProps({ mode: 'kelvin' });
    expect(cells(w, 'io')).toEqual(['5.0', '8.0', '0.4', '13.4']);
    expect(w.text()).toContain('R_ij·P_j');
  });

  test('sorts rows by a column, toggling the direction', async () => {
    const w = mount(CouplingMatrix, { props: { result: smallResult(), mode: 'kelvin' } });
    await w.get('[data-test="col-cpu"] button').trigger('click');
    expect(order(w)).toEqual(['row-cpu', 'row-mem', 'row-io']);
    expect(w.get('[data-test="col-cpu"]').attributes('aria-sort')).toBe('descending');
    await w.get('[data-test="col-cpu"] button').trigger('click');
    expect(order(w)).toEqual(['row-io', 'row-mem', 'row-cpu']);
    await w.get('[data-test="sort-total"]').trigger('click');
    expect(order(w)).toEqual(['row-cpu', 'row-mem', 'row-io']);
  });

  test('highlights the selected part row and column and reports clicks', async () => {
    const w = mount(CouplingMatrix, { props: { result: smallResult(), selected: 'io' } });
    expect(w.get('[data-test="row-io"]').classes()).toContain('hl');
    expect(w.get('[data-test="col-io"]').classes()).toContain('hl');
    expect(w.get('[data-test="row-cpu"]').findAll('td')[1].classes()).toContain('hl');
    expect(w.get('[data-test="row-cpu"]').classes()).not.toContain('hl');
    await w.get('[data-test="row-mem"] td').trigger('click');
    expect(w.emitted('select')).toEqual([['mem']]);
  });

  test('self cells are outlined and unpainted; other cells carry the colour scale', () => {
    const w = mount(CouplingMatrix, { props: { result: smallResult() } });
    const tds = w.get('[data-test="row-cpu"]').findAll('td');
    expect(tds[0].classes()).toContain('self');
    expect(tds[0].attributes('style')).toBeUndefined();
    expect(tds[2].attributes('style')).toContain('background');
  });

  test('memory tiers fold out under their stack', async () => {
    const w = mount(CouplingMatrix, { props: { result: smallResult(), mode: 'resistance' } });
    expect(w.findAll('tbody tr')).toHaveLength(3);
    await w.get('[data-test="fold-mem"]').trigger('click');
    expect(order(w)).toEqual(['row-cpu', 'row-io', 'row-mem', 'row-mem#1', 'row-mem#2']);
    expect(cells(w, 'mem#1')).toEqual(['0.100', '0.200', '1.000']);
  });
});
