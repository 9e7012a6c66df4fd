/** Heat-flow arrows and the "who heats me" waterfall (values from the hand-made fixture). */
import { describe, expect, test } from 'vitest';
import type { Model } from '@shared/schemas/model';
import { expectClose } from '../../helpers/float';
import { flowArrows } from '@/components/coupling/flowArrows';
import { whoHeats } from '@/components/coupling/whoHeats';
import { smallResult } from './fixture';

const rect = (id: string, x: number, y: number) => ({ id, x, y, width: 0.01, height: 0.01, rotation: 0 });
const parts = [rect('cpu', 0.01, 0.01), rect('io', 0.03, 0.01), rect('mem', 0.01, 0.03)] as unknown as Model['parts'];

describe('flowArrows', () => {
  test('one arrow per contribution at or above the threshold, from heating to heated part', () => {
    const all = flowArrows(parts, smallResult(), 40, 10, 0);
    expect(all).toHaveLength(6);
    const over2 = flowArrows(parts, smallResult(), 40, 10, 2);
    expect(over2.map((a) => a.key).sort()).toEqual(['cpu>io', 'cpu>mem', 'io>mem']);
    const big = over2.find((a) => a.key === 'cpu>mem')!;
    const small = over2.find((a) => a.key === 'io>mem')!;
    expect(big.width).toBeGreaterThan(small.width);
    expect(big.kelvin).toBe(10);
  });

  test('an arrow runs from the source toward the target (cpu at y 10 mm, mem at y 30 mm: world y decreases)', () => {
    const a = flowArrows(parts, smallResult(), 40, 10, 9)[0];
    const ys = a.points.split(' ').map((p) => Number(p.split(',')[1]));
    expect(Math.min(...ys)).toBeLessThan(30);
    expect(Math.max(...ys)).toBeLessThanOrEqual(30 + 1e-9);
  });
});

describe('whoHeats', () => {
  test('bars start with the own heat and add up to the rise above the fluid (fixture: 54 − 40 = 14 K)', () => {
    const w = whoHeats(smallResult(), 'mem')!;
    expect(w.bars.map((b) => b.id)).toEqual(['mem', 'cpu', 'io']);
    expectClose(w.rise, 14, 1e-12, 0, 'rise');
    expectClose(w.bars[2].start, 12, 1e-12, 0, 'waterfall start of the last bar');
    expect(whoHeats(smallResult(), 'nope')).toBeNull();
  });
});
