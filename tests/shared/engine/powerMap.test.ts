/** Power maps: the hot spot follows the map (and its rotation); the mean is unchanged by the map. */
import { describe, expect, it } from 'vitest';
import { solveAssembly } from '@shared/engine/assembly';
import { rotateMap } from '@shared/engine/assembly/powerMap';
import { expectClose } from '../../helpers/float';
import { logicPart, model, stack } from './assemblyFixtures';

const W = 0.03;
const H = 0.024;
/** 4 × 2 map, all power in the cell at the highest x of row 0 (lowest y). */
const CORNER = { nx: 4, ny: 2, weights: [0, 0, 0, 1, 0, 0, 0, 0] };

function solve(rotation: 0 | 90, map?: typeof CORNER) {
  const part = logicPart('a', 0.015, 0.012, 0.012, 0.008, { rotation });
  return solveAssembly(model(stack(W, H), [part], { a: { power: 40, ...(map ? { map } : {}) } }), 'run').parts[0];
}

describe('power maps', () => {
  it('rotateMap turns the grid counter-clockwise', () => {
    const r = rotateMap(CORNER, 90);
    expect([r.nx, r.ny]).toEqual([2, 4]);
    // (ix 3, iy 0) → x' = ny−1−iy = 1, y' = ix = 3.
    expect(r.w[3 * 2 + 1]).toBe(1);
  });

  it('a corner-loaded map moves the hot spot to that corner and raises it; the mean stays', () => {
    const uniform = solve(0);
    const corner = solve(0, CORNER);
    expectClose(corner.junction, uniform.junction, 1e-9, 0, 'mean junction (the map only redistributes)');
    expect(corner.peak).toBeGreaterThan(uniform.peak + 1);
    expect(corner.peakAt.x).toBeGreaterThan(0.015 + 0.003);
    expect(corner.peakAt.y).toBeLessThan(0.012);
  });

  it('rotating the part by 90° rotates where the hot spot is', () => {
    const turned = solve(90, CORNER);
    expect(turned.peakAt.x).toBeGreaterThan(0.015);
    expect(turned.peakAt.y).toBeGreaterThan(0.012 + 0.003);
  });
});
