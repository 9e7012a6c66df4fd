/**
 * CSV writing shared by every export: RFC 4180 quoting (via papaparse), CRLF line ends, text cells
 * that a spreadsheet could read as a formula are escaped, numbers keep 10 significant digits.
 */
import Papa from 'papaparse';

/** One CSV cell: text, a number, or empty. */
export type Cell = string | number | null;

/** Significant digits written for numbers (far beyond the model's accuracy, short enough to read). */
export const CSV_DIGITS = 10;

/** A number as written to CSV: 10 significant digits, no trailing zeros; non-finite numbers become empty cells. */
export function csvNumber(x: number): number | null {
  return Number.isFinite(x) ? Number(x.toPrecision(CSV_DIGITS)) : null;
}

/** Rows → CSV text (header row first), ending with a line break. */
export function toCsv(rows: Cell[][]): string {
  const clean = rows.map((row) => row.map((c) => (typeof c === 'number' ? csvNumber(c) : c)));
  return Papa.unparse(clean, { newline: '\r\n', escapeFormulae: true }) + '\r\n';
}

/** Separators a CSV may use: comma, else semicolon or tab (spreadsheets in some locales), taken from the first content line. */
export function csvDelimiter(firstLine: string): string {
  return firstLine.includes(',') ? ',' : ([';', '\t'].find((d) => firstLine.includes(d)) ?? ',');
}

/** Split CSV text into physical lines with their 1-based line numbers, skipping blank lines and `#` comments. */
export function csvLines(text: string): { line: number; cells: string[] }[] {
  const out: { line: number; cells: string[] }[] = [];
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const delimiter = csvDelimiter(lines.find((l) => l.trim() && !l.trimStart().startsWith('#')) ?? '');
  lines.forEach((raw, i) => {
    if (!raw.trim() || raw.trimStart().startsWith('#')) return;
    const parsed = Papa.parse<string[]>(raw, { header: false, delimiter });
    out.push({ line: i + 1, cells: (parsed.data[0] ?? []).map((c) => c.trim()) });
  });
  return out;
}

/** A problem found while reading a file: 1-based line (0 when it concerns the whole file), optional column, message. */
export interface LineIssue {
  line: number;
  column?: string;
  message: string;
}

/** Parse a CSV cell as a finite number; null when it is not one. */
export function cellNumber(cell: string | undefined): number | null {
  if (cell === undefined || cell.trim() === '') return null;
  const x = Number(cell.trim());
  return Number.isFinite(x) ? x : null;
}
