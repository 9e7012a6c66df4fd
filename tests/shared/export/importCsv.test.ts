/** Floorplan and power-map CSV readers: units, line-numbered errors, and the floorplan applied to a base model. */
import { describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { modelSchema } from '@shared/schemas/model';
import { checkModelReferences, floorplanToModel, powerMapToCsv, readFloorplanCsv, readPowerMapCsv } from '@shared/export';

const good = [
  'name,type,x (mm),y (mm),width (mm),height (mm),power (W)',
  '# a comment line',
  'Compute chiplet South,compute,12,17,13,15,160',
  'Memory north,memory,30,28,11,10,7.8',
  'New IO,io,40,8,8,10,20',
  '',
].join('\n');

describe('floorplan CSV', () => {
  it('reads parts in SI from mm and W', () => {
    const r = readFloorplanCsv(good);
    expect(r.errors).toEqual([]);
    expect(r.parts.map((p) => [p.line, p.id, p.kind])).toEqual([[3, 'compute-chiplet-south', 'compute'], [4, 'memory-north', 'memory'], [5, 'new-io', 'io']]);
    expect(r.parts[0]).toMatchObject({ x: 0.012, y: 0.017, width: 0.013, height: 0.015, power: 160 });
  });

  it('names the line and column of every error', () => {
    const text = ['name,type,x,y,width,height,power', 'A,compute,1,2,3,4,5', 'B,widget,1,2,3,4,5', 'C,io,one,2,-3,4,5', 'a,io,1,2,3,4,5'].join('\n');
    const r = readFloorplanCsv(text);
    expect(r.errors).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ line: 3, column: 'type' }),
        expect.objectContaining({ line: 4, column: 'x' }),
        expect.objectContaining({ line: 4, column: 'width' }),
        expect.objectContaining({ line: 5, column: 'name', message: expect.stringMatching(/line 2/) }),
      ]),
    );
    expect(r.parts.map((p) => p.name)).toEqual(['A']);
  });

  it('refuses other units and missing columns in the header', () => {
    const r = readFloorplanCsv('name,type,x (m),y,width,height\nA,io,1,2,3,4');
    expect(r.errors.map((e) => e.message).join(' ')).toMatch(/x must be given in mm/);
    expect(r.errors.map((e) => e.message).join(' ')).toMatch(/no "power" column/);
    expect(readFloorplanCsv('').errors[0].message).toMatch(/empty/);
  });

  it('applies to a base model: matched parts keep their layers, new ones copy a part of their kind, powers become a scenario', () => {
    const base = lx9Model('A');
    const plan = readFloorplanCsv(good).parts;
    const m = floorplanToModel(base, plan);
    expect(modelSchema.safeParse(m).success).toBe(true);
    expect(checkModelReferences(m)).toEqual([]);
    expect(m.parts.length).toBe(3);
    const cpu = m.parts.find((p) => p.name === 'Compute chiplet South')!;
    expect(cpu.id).toBe('cpu-w');
    expect(cpu.electrical).toEqual(base.parts.find((p) => p.id === 'cpu-w')!.electrical);
    expect(m.parts.find((p) => p.name === 'New IO')!.die).toEqual(base.parts.find((p) => p.id === 'io')!.die);
    const mem = m.parts.find((p) => p.name === 'Memory north')!;
    expect(mem.memory?.tiers).toBeGreaterThan(0);
    expect(m.scenarios[0].name).toBe('From floorplan CSV');
    expect(m.scenarios[0].loads[cpu.id].power).toBe(160);
    expect(m.scenarios.length).toBe(base.scenarios.length + 1);
    expect(m.stack).toEqual(base.stack);
  });
});

describe('power-map CSV', () => {
  it('reads a grid with the first line as the top edge (row 0 of the model = lowest y)', () => {
    const r = readPowerMapCsv('# top row first\n1,2,3\n4,5,6\n');
    expect(r.errors).toEqual([]);
    expect(r.map).toEqual({ nx: 3, ny: 2, weights: [4, 5, 6, 1, 2, 3] });
    expect(readPowerMapCsv(powerMapToCsv(r.map!)).map).toEqual(r.map);
  });

  it('accepts semicolon- or tab-separated grids (spreadsheet exports in some locales)', () => {
    expect(readPowerMapCsv('1;2\n3;4').map).toEqual({ nx: 2, ny: 2, weights: [3, 4, 1, 2] });
    expect(readPowerMapCsv('1\t2\n3\t4').map).toEqual({ nx: 2, ny: 2, weights: [3, 4, 1, 2] });
  });

  it('reports ragged rows, non-numbers, negatives and all-zero grids by line', () => {
    const r = readPowerMapCsv('1,2\n3\nx,-1');
    expect(r.map).toBeNull();
    expect(r.errors).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ line: 2, message: expect.stringMatching(/1 values/) }),
        expect.objectContaining({ line: 3, column: '1' }),
        expect.objectContaining({ line: 3, column: '2', message: expect.stringMatching(/negative/) }),
      ]),
    );
    expect(readPowerMapCsv('0,0\n0,0').errors[0].message).toMatch(/zero/);
  });
});
