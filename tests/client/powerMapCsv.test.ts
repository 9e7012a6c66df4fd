// @vitest-environment happy-dom
/** Power-map CSV on the Loads screen (the shared reader plus a size check): orientation, line/column messages. */
import { describe, expect, test } from 'vitest';
import { parsePowerMapCsv } from '@/components/loads/powerMapCsv';

const problem = (text: string, bytes?: number) => {
  const r = parsePowerMapCsv(text, bytes);
  if (r.ok) throw new Error('expected a problem');
  return r.problem;
};

describe('parsePowerMapCsv', () => {
  test('first line is the top edge: it becomes the last row of the map (row 0 = lowest y)', () => {
    const r = parsePowerMapCsv('1,2,3\n4,5,6\n');
    expect(r).toEqual({ ok: true, map: { nx: 3, ny: 2, weights: [4, 5, 6, 1, 2, 3] } });
  });
  test('semicolons, tabs, CRLF, a byte-order mark, blank lines and # comments are accepted', () => {
    expect(parsePowerMapCsv('\uFEFF1;0\r\n0;1\r\n\r\n')).toEqual({ ok: true, map: { nx: 2, ny: 2, weights: [0, 1, 1, 0] } });
    expect(parsePowerMapCsv('1\t2\n3\t4')).toMatchObject({ ok: true, map: { nx: 2, ny: 2 } });
    expect(parsePowerMapCsv('# hot corner top right\n1,2\n\n3,4')).toEqual({ ok: true, map: { nx: 2, ny: 2, weights: [3, 4, 1, 2] } });
  });
  test('a word in the grid is reported with its line and column', () => {
    expect(problem('1,2,3\n4,5,abc\n')).toEqual({ message: 'Line 2, column 3: Value 3 ("abc") is not a number.', line: 2, column: 3 });
  });
  test('negative, empty and ragged cells name their place', () => {
    expect(problem('1,-2\n1,1')).toMatchObject({ line: 1, column: 2 });
    expect(problem('1,,2\n1,1,1')).toMatchObject({ line: 1, column: 2, message: 'Line 1, column 2: Value 2 is empty.' });
    expect(problem('1,2,3\n4,5\n')).toMatchObject({ line: 2 });
  });
  test('size limits: 64 × 64 cells and 200 kB; all-zero maps are refused', () => {
    const row = (n: number) => Array(n).fill('1').join(',');
    expect(problem(Array(65).fill(row(2)).join('\n')).message).toContain('at most 64 × 64');
    expect(problem(row(65)).message).toContain('at most 64 × 64');
    expect(parsePowerMapCsv(Array(64).fill(row(64)).join('\n'))).toMatchObject({ ok: true, map: { nx: 64, ny: 64 } });
    expect(problem('1', 300 * 1024).message).toContain('200 kB');
    expect(problem('0,0\n0,0').message).toContain('zero');
    expect(problem('').message).toContain('no rows');
  });
});
