/** Matrix rows: the three views, tier rows, sorting (values from the hand-made fixture). */
import { describe, expect, test } from 'vitest';
import { expectClose } from '../../helpers/float';
import { matrixRows, offDiagonalMax, sortRows } from '@/components/coupling/matrixView';
import { smallResult } from './fixture';

describe('matrixRows', () => {
  test('K/W view is the influence matrix', () => {
    const rows = matrixRows(smallResult(), 'resistance');
    expect(rows.map((r) => r.key)).toEqual(['cpu', 'io', 'mem']);
    expect(rows[1].values).toEqual([0.05, 0.8, 0.2]);
    expect(rows[1].total).toBeNull();
  });

  test('% view divides each row by its own R_ii (fixture: 0.05 / 0.8 = 6.25 %)', () => {
    const rows = matrixRows(smallResult(), 'percent');
    expectClose(rows[1].values[0], 6.25, 1e-12, 0, 'io ← cpu');
    expectClose(rows[1].values[1], 100, 1e-12, 0, 'io self');
  });

  test('K view is R_ij·P_j and sums to the rise above the fluid (fixture: 54 − 40 = 14 K)', () => {
    const rows = matrixRows(smallResult(), 'kelvin');
    expect(rows[2].values).toEqual([10, 2, 2]);
    expectClose(rows[2].total!, 14, 1e-12, 0, 'mem rise');
  });

  test('tiers follow their stack when expanded; kelvin rows add up to the tier rise (fixture: 54.5 − 40 K)', () => {
    const rows = matrixRows(smallResult(), 'kelvin', new Set(['mem']));
    expect(rows.map((r) => r.key)).toEqual(['cpu', 'io', 'mem', 'mem#1', 'mem#2']);
    expectClose(rows[3].values[2], 2.5, 1e-12, 0, 'tier 1 ← own stack');
    expectClose(rows[3].total!, 14.5, 1e-12, 0, 'tier 1 rise');
    expectClose(rows[4].total!, 14.75, 1e-12, 0, 'tier 2 rise');
    const kw = matrixRows(smallResult(), 'resistance', new Set(['mem']));
    expect(kw[4].values).toEqual([0.1, 0.2, 1.0]);
  });

  test('sorting keeps tiers under their stack; the colour top ignores self cells', () => {
    const rows = matrixRows(smallResult(), 'kelvin', new Set(['mem']));
    const byCpu = sortRows(rows, { by: 0, descending: true });
    expect(byCpu.map((r) => r.key)).toEqual(['cpu', 'mem', 'mem#1', 'mem#2', 'io']);
    const byName = sortRows(rows, { by: 'label', descending: false });
    expect(byName.map((r) => r.key)).toEqual(['cpu', 'io', 'mem', 'mem#1', 'mem#2']);
    expect(offDiagonalMax(rows)).toBe(10);
  });
});
