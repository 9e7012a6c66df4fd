/**
 * Power-map CSV: a grid of non-negative weights over a part's footprint, drawn as seen on screen —
 * the first line is the top edge (highest y), the first column the left edge. Weights are relative
 * (the engine normalises them); the model stores row 0 = lowest y, so the reader flips the rows.
 */
import { powerMapSchema, type PowerMap } from '../schemas/model';
import { cellNumber, csvLines, toCsv, type LineIssue } from './csv';

/** Largest grid side (the model's limit). */
export const POWER_MAP_MAX_SIDE = 64;

/** Comment line written above a power-map CSV. */
export const POWER_MAP_NOTE = '# Heatloom power map: relative weights (no unit); first line = top edge (highest y), first column = left edge';

/** Result of reading a power-map CSV: the map (null when any error was found) and line-numbered errors. */
export interface PowerMapRead {
  map: PowerMap | null;
  errors: LineIssue[];
}

/** Read a power-map CSV (blank lines and `#` comments are skipped). */
export function readPowerMapCsv(text: string): PowerMapRead {
  const errors: LineIssue[] = [];
  const lines = csvLines(text);
  if (!lines.length) return { map: null, errors: [{ line: 0, message: 'The file has no rows of weights.' }] };
  const nx = lines[0].cells.length;
  if (lines.length > POWER_MAP_MAX_SIDE || nx > POWER_MAP_MAX_SIDE) {
    errors.push({ line: 0, message: `The grid is ${nx} × ${lines.length}; at most ${POWER_MAP_MAX_SIDE} × ${POWER_MAP_MAX_SIDE} cells.` });
  }
  const rows: number[][] = [];
  for (const { line, cells } of lines) {
    if (cells.length !== nx) errors.push({ line, message: `This row has ${cells.length} values; the first row has ${nx}.` });
    const row = cells.map((c, i) => {
      const v = cellNumber(c);
      if (c.trim() === '') errors.push({ line, column: String(i + 1), message: `Value ${i + 1} is empty.` });
      else if (v === null) errors.push({ line, column: String(i + 1), message: `Value ${i + 1} ("${c}") is not a number.` });
      else if (v < 0) errors.push({ line, column: String(i + 1), message: `Value ${i + 1} is negative (${v}); weights must be ≥ 0.` });
      return v ?? 0;
    });
    rows.push(row);
  }
  if (!errors.length && !rows.some((r) => r.some((v) => v > 0))) errors.push({ line: 0, message: 'Every weight is zero; at least one must be positive.' });
  if (errors.length) return { map: null, errors: errors.slice(0, 50) };
  const weights = rows.slice().reverse().flat();
  return { map: powerMapSchema.parse({ nx, ny: rows.length, weights }), errors };
}

/** Write a power map as CSV in the same orientation (top row first). */
export function powerMapToCsv(map: PowerMap): string {
  const rows = Array.from({ length: map.ny }, (_, iy) => map.weights.slice((map.ny - 1 - iy) * map.nx, (map.ny - iy) * map.nx));
  return `${POWER_MAP_NOTE}\r\n${toCsv(rows)}`;
}
