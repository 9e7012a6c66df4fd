/**
 * Spectral flux channel vs our own finite-volume reference (tests/shared/engine/fv.ts): two orthotropic
 * layers with a contact resistance, three sources. The FV error must shrink under refinement (second order)
 * and the finest grid must agree within its discretisation error (physics.md §5: ≈ 1 %). Measured: 1.6 %,
 * 0.54 %, 0.17 % on 16×12×3, 32×24×6, 64×48×12 cells.
 */
import { describe, expect, it } from 'vitest';
import { channelInfluence, meanRises } from '@shared/engine/channel';
import { expectClose } from '../../helpers/float';
import { solveFv, type FvLayer } from './fv';

const LX = 8e-3;
const LY = 6e-3;
const H = 3000;
const SOURCES = [
  { x: 2.25e-3, y: 2.0e-3, width: 2.5e-3, height: 2.0e-3, power: 4 },
  { x: 5.25e-3, y: 4.5e-3, width: 1.5e-3, height: 2.0e-3, power: 2 },
  { x: 6.75e-3, y: 1.0e-3, width: 1.5e-3, height: 1.0e-3, power: 1 },
];
const layers = (s: number): FvLayer[] => [
  { thickness: 0.4e-3, kxy: 150, kz: 40, contactResistance: 2e-6, cells: s },
  { thickness: 1.2e-3, kxy: 30, kz: 3, cells: 2 * s },
];

describe('finite-volume reference', () => {
  it('converges toward the spectral mean rises', () => {
    const channel = { lx: LX, ly: LY, above: { layers: layers(1), h: H }, below: { layers: [], h: 0 } };
    const spectral = channelInfluence(channel, SOURCES, { cache: null });
    const exact = meanRises(spectral.flat, SOURCES.map((s) => s.power));
    const errors: number[] = [];
    const results: number[][] = [];
    for (const s of [1, 2, 4]) {
      const fv = solveFv({ lx: LX, ly: LY, nx: 16 * s, ny: 12 * s, layers: layers(s), h: H, sources: SOURCES });
      results.push(fv.meanRise);
      errors.push(Math.max(...fv.meanRise.map((v, i) => Math.abs(v - exact[i]) / exact[i])));
    }
    expect(errors[1]).toBeLessThan(errors[0]);
    expect(errors[2]).toBeLessThan(errors[1]);
    expect(errors[2]).toBeLessThan(0.01);
    // Second order: one Richardson step on the two finest grids lands much closer.
    results[2].forEach((fine, i) => {
      const extrapolated = fine + (fine - results[1][i]) / 3;
      expectClose(extrapolated, exact[i], 0.002, 0, `source ${i + 1}: FV extrapolated vs spectral (own FV reference)`);
    });
  });
});
