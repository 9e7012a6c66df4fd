/**
 * Power-map CSV: a grid of non-negative weights over a part's footprint, as seen from above on the
 * layout (first line = top edge, first column = left edge). Parsed with papaparse; any problem is
 * reported with its line and column so the user can fix the file.
 */
import Papa from 'papaparse';
import type { PowerMap } from '@shared/schemas/model';

/** Size limits of an uploaded map: 64 × 64 cells (the model's limit) and 200 kB. */
export const POWER_MAP_LIMITS = { maxRows: 64, maxColumns: 64, maxBytes: 200 * 1024 };

/** A problem in the file; line and column count from 1 (absent for whole-file problems). */
export interface CsvProblem { message: string; line?: number; column?: number }

/** Parsed map or the first problem found. */
export type CsvResult = { ok: true; map: PowerMap } | { ok: false; problem: CsvProblem };

const fail = (message: string, line?: number, column?: number): CsvResult => ({
  ok: false,
  problem: { message: line ? `Line ${line}${column ? `, column ${column}` : ''}: ${message}` : message, line, column },
});

/** Parse CSV text (`bytes` = file size when known) into a power map with row 0 at the lowest y. */
export function parsePowerMapCsv(text: string, bytes = text.length): CsvResult {
  const { maxRows, maxColumns, maxBytes } = POWER_MAP_LIMITS;
  if (bytes > maxBytes) return fail(`The file is ${Math.ceil(bytes / 1024)} kB; the limit is ${maxBytes / 1024} kB.`);
  const clean = text.replace(/^\uFEFF/, '');
  const first = clean.split(/\r?\n/).find((l) => l.trim()) ?? '';
  const delimiter = [',', ';', '\t'].find((d) => first.includes(d)) ?? ',';
  const parsed = Papa.parse<string[]>(clean, { skipEmptyLines: false, delimiter });
  const rows = parsed.data.map((r) => r.map((c) => c.trim()));
  while (rows.length && rows[rows.length - 1].every((c) => c === '')) rows.pop();
  const err = parsed.errors.find((e) => e.type !== 'Delimiter' && (e.row ?? 0) < rows.length);
  if (err) return fail(err.message, (err.row ?? 0) + 1);
  if (!rows.length) return fail('The file holds no numbers.');
  if (rows.length > maxRows) return fail(`more than ${maxRows} rows; a power map has at most ${maxRows} × ${maxColumns} cells.`, maxRows + 1);
  const nx = rows[0].length;
  const weights = new Array<number>(rows.length * nx);
  for (let r = 0; r < rows.length; r++) {
    const line = r + 1;
    const row = rows[r];
    if (row.every((c) => c === '')) return fail('empty line inside the grid.', line);
    if (row.length > maxColumns) return fail(`more than ${maxColumns} values in a row.`, line, maxColumns + 1);
    if (row.length !== nx) return fail(`${row.length} values, but line 1 has ${nx}; every line needs the same count.`, line, Math.min(row.length, nx) + 1);
    for (let c = 0; c < nx; c++) {
      const cell = row[c];
      const v = cell === '' ? NaN : Number(cell);
      if (cell === '') return fail('empty value.', line, c + 1);
      if (!Number.isFinite(v)) return fail(`"${cell.slice(0, 20)}" is not a number.`, line, c + 1);
      if (v < 0) return fail(`${cell} is negative; weights must be 0 or more.`, line, c + 1);
      weights[(rows.length - 1 - r) * nx + c] = v;
    }
  }
  if (!weights.some((w) => w > 0)) return fail('All weights are zero; at least one must be positive.');
  return { ok: true, map: { nx, ny: rows.length, weights } };
}
