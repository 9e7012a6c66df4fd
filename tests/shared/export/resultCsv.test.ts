/** Result CSVs: units in the header row, labels, numbers readable back, CRLF rows, formula escaping. */
import { beforeAll, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { lx9Model } from '@shared/demo/lx9';
import { solveAssembly } from '@shared/engine/assembly/solve';
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { matrixCsv, temperaturesCsv, TEMPERATURE_COLUMNS, toCsv } from '@shared/export';
import { expectClose } from '../../helpers/float';

const rows = (text: string) => Papa.parse<string[]>(text.trimEnd(), { header: false }).data;

describe('result CSVs', () => {
  let result: AssemblyResult;
  beforeAll(() => {
    result = solveAssembly(lx9Model('A'), 'boost', { mapSize: 16 });
  });

  it('writes the influence matrix with R (K/W) in the header row and part ids on both axes', () => {
    const text = matrixCsv(result);
    expect(text.includes('\r\n')).toBe(true);
    const r = rows(text);
    expect(r[0][0]).toMatch(/^R \(K\/W\)/);
    expect(r[0].slice(1)).toEqual(result.influence.partIds);
    expect(r.slice(1).map((x) => x[0])).toEqual(result.influence.partIds);
    // 10 significant digits are written (csv.ts), so values read back to 1e-9 relative.
    result.influence.matrix.forEach((row, i) => row.forEach((v, j) => expectClose(Number(r[i + 1][j + 1]), v, 1e-9, 0, `R[${i}][${j}]`)));
  });

  it('writes node-level and contribution matrices with their units', () => {
    const nodes = rows(matrixCsv(result, 'nodes'));
    expect(nodes[0]).toContain('mem-1/tier 8');
    expect(nodes.length).toBe(result.tierInfluence.nodes.length + 1);
    const contribution = rows(matrixCsv(result, 'contribution'));
    expect(contribution[0][0]).toMatch(/^ΔT \(K\).*boost/i);
  });

  it('writes temperatures with units per column, one row per part and per DRAM tier', () => {
    const r = rows(temperaturesCsv([result]));
    expect(r[0]).toEqual([...TEMPERATURE_COLUMNS]);
    expect(r[0]).toContain('mean temperature (°C)');
    const tiers = result.parts.reduce((s, p) => s + p.tiers.length, 0);
    expect(r.length).toBe(1 + result.parts.length + tiers);
    const cpu = r.find((x) => x[1] === 'cpu-w' && x[4] === 'junction')!;
    expectClose(Number(cpu[6]), result.parts.find((p) => p.id === 'cpu-w')!.junction, 1e-9, 0, 'cpu-w junction');
  });

  it('quotes separators and escapes text a spreadsheet would run as a formula', () => {
    const text = toCsv([['a,b', '=SUM(A1)', -2.5, null]]);
    expect(text).toBe('"a,b","\'=SUM(A1)",-2.5,\r\n');
  });
});
