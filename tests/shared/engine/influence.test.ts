/** The grouped pair sums of influence.ts equal the plain double sum (with the same Richardson step). */
import { describe, it } from 'vitest';
import { channelModes } from '@shared/engine/channel';
import { influenceFromSpectra, richardson } from '@shared/engine/influence';
import type { RectSource } from '@shared/engine/types';
import { expectClose } from '../../helpers/float';

const CHANNEL = { lx: 0.03, ly: 0.02, above: { layers: [{ thickness: 1e-3, kxy: 100, kz: 50 }], h: 3000 }, below: { layers: [], h: 0 } };

function direct(sources: RectSource[]): { got: Float64Array; expected: number[] } {
  const modes = channelModes(CHANNEL, sources, { truncation: { m: 60, n: 50 }, cache: null });
  const { fx, fy, m, n, count } = modes.spectra;
  const { hm, hn, factor } = richardson(m, n);
  const expected: number[] = [];
  for (let j = 0; j < count; j++) {
    for (let i = 0; i < count; i++) {
      let full = 0;
      let half = 0;
      for (let p = 0; p < m; p++) {
        for (let q = 0; q < n; q++) {
          const v = modes.table.w[p * modes.table.n + q] * fx[i * m + p] * fx[j * m + p] * fy[i * n + q] * fy[j * n + q];
          full += v;
          if (p < hm && q < hn) half += v;
        }
      }
      expected.push(full + (full - half) * factor);
    }
  }
  return { got: influenceFromSpectra(modes.table, modes.spectra), expected };
}

describe('grouped influence sums', () => {
  it.each([
    ['a row sharing y and height', [{ x: 0.005, y: 0.005, width: 0.004, height: 0.004 }, { x: 0.015, y: 0.005, width: 0.004, height: 0.004 }, { x: 0.025, y: 0.005, width: 0.004, height: 0.004 }, { x: 0.015, y: 0.014, width: 0.006, height: 0.003 }]],
    ['a column sharing x and width', [{ x: 0.005, y: 0.005, width: 0.004, height: 0.004 }, { x: 0.005, y: 0.012, width: 0.004, height: 0.004 }, { x: 0.005, y: 0.017, width: 0.004, height: 0.002 }, { x: 0.02, y: 0.01, width: 0.006, height: 0.003 }]],
    ['all different', [{ x: 0.006, y: 0.005, width: 0.004, height: 0.003 }, { x: 0.015, y: 0.012, width: 0.005, height: 0.004 }, { x: 0.024, y: 0.006, width: 0.003, height: 0.002 }]],
  ])('%s', (_, sources) => {
    const { got, expected } = direct(sources);
    expected.forEach((v, k) => expectClose(got[k], v, 1e-12, 1e-14 * Math.abs(expected[0]), `entry ${k} (plain double sum)`));
  });
});
