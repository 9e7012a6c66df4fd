/**
 * Power-map CSV on the Loads screen: the shared reader (shared/export/powerMapCsv.ts, the same one the
 * import route uses), plus a file-size check, reduced to the first problem with its line and column.
 */
import type { PowerMap } from '@shared/schemas/model';
import { POWER_MAP_MAX_SIDE, readPowerMapCsv } from '@shared/export';

/** Size limits of an uploaded map: 64 × 64 cells (the model's limit) and 200 kB. */
export const POWER_MAP_LIMITS = { maxRows: POWER_MAP_MAX_SIDE, maxColumns: POWER_MAP_MAX_SIDE, maxBytes: 200 * 1024 };

/** A problem in the file; line and column count from 1 (absent for whole-file problems). */
export interface CsvProblem { message: string; line?: number; column?: number }

/** Parsed map or the first problem found. */
export type CsvResult = { ok: true; map: PowerMap } | { ok: false; problem: CsvProblem };

/** Parse CSV text (`bytes` = file size when known) into a power map with row 0 at the lowest y. */
export function parsePowerMapCsv(text: string, bytes = text.length): CsvResult {
  const { maxBytes } = POWER_MAP_LIMITS;
  if (bytes > maxBytes) return { ok: false, problem: { message: `The file is ${Math.ceil(bytes / 1024)} kB; the limit is ${maxBytes / 1024} kB.` } };
  const read = readPowerMapCsv(text);
  if (read.map) return { ok: true, map: read.map };
  const first = read.errors[0];
  const line = first.line || undefined;
  const column = first.column ? Number(first.column) : undefined;
  const where = line ? `Line ${line}${column ? `, column ${column}` : ''}: ` : '';
  return { ok: false, problem: { message: `${where}${first.message}`, line, column } };
}
