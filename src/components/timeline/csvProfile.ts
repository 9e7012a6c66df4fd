/**
 * A power profile from CSV: a header `time_s` (or `time_ms`) followed by one column per part (its id
 * or name), then one row per change. Each row's powers hold until the next row's time; the last row
 * marks the end of the profile. Errors name the line and column.
 */
import Papa from 'papaparse';
import type { Part, Segment } from '@shared/schemas/model';
import { DRAFT_LIMITS } from './profileDraft';

/** Result of reading a profile CSV: segments per part id, or the problems found. */
export interface CsvProfile {
  parts: Record<string, Segment[]>;
  issues: string[];
  /** Profile length (s). */
  end: number;
}

const TIME_UNITS: Record<string, number> = { time_s: 1, time_ms: 1e-3 };

/** Parse CSV text against the model's parts. */
export function parseProfileCsv(text: string, parts: readonly Pick<Part, 'id' | 'name'>[]): CsvProfile {
  const parsed = Papa.parse<string[]>(text.trim(), { skipEmptyLines: 'greedy' });
  const issues: string[] = parsed.errors.slice(0, 5).map((e) => `Line ${(e.row ?? 0) + 1}: ${e.message}.`);
  const rows = parsed.data.map((r) => r.map((c) => c.trim()));
  const fail = (): CsvProfile => ({ parts: {}, issues: issues.slice(0, 10), end: 0 });
  if (rows.length < 3) return (issues.push('The file needs a header line and at least two rows (a start at 0 and an end time).'), fail());
  const [header, ...body] = rows;
  const scale = TIME_UNITS[header[0]?.toLowerCase() ?? ''];
  if (!scale) issues.push(`Line 1, column 1: the first column must be "time_s" or "time_ms", not "${header[0] ?? ''}".`);
  const ids = header.slice(1).map((name, c) => {
    const part = parts.find((p) => p.id === name) ?? parts.find((p) => p.name.toLowerCase() === name.toLowerCase());
    if (!part) issues.push(`Line 1, column ${c + 2}: "${name}" is not a part of this model (use a part id such as "${parts[0]?.id ?? 'cpu-0'}").`);
    return part?.id ?? '';
  });
  if (ids.length === 0) issues.push('Line 1: add at least one part column after the time column.');
  if (issues.length) return fail();
  const times: number[] = [];
  const powers: number[][] = [];
  body.forEach((row, r) => {
    const line = r + 2;
    if (row.length !== header.length) issues.push(`Line ${line}: expected ${header.length} values, found ${row.length}.`);
    const t = Number(row[0]) * scale;
    if (row[0] === '' || !Number.isFinite(t)) issues.push(`Line ${line}, column 1: "${row[0]}" is not a time.`);
    else if (r === 0 && t !== 0) issues.push(`Line ${line}, column 1: the first time must be 0.`);
    else if (r > 0 && !(t > times[r - 1])) issues.push(`Line ${line}, column 1: times must increase — ${row[0]} follows ${body[r - 1][0]}.`);
    times.push(t);
    const isLast = r === body.length - 1;
    powers.push(ids.map((_, c) => {
      const raw = row[c + 1] ?? '';
      const p = Number(raw);
      if (isLast && raw === '') return 0;
      if (raw === '' || !Number.isFinite(p)) issues.push(`Line ${line}, column ${c + 2} (${header[c + 1]}): "${raw}" is not a power in W.`);
      else if (p < 0) issues.push(`Line ${line}, column ${c + 2} (${header[c + 1]}): power cannot be negative (${raw} W).`);
      else if (p > DRAFT_LIMITS.power) issues.push(`Line ${line}, column ${c + 2} (${header[c + 1]}): ${raw} W is above ${DRAFT_LIMITS.power} W.`);
      return p;
    }));
  });
  if (issues.length) return fail();
  const out: Record<string, Segment[]> = {};
  ids.forEach((id, c) => {
    const segs: Segment[] = [];
    for (let r = 0; r + 1 < times.length; r++) {
      const duration = times[r + 1] - times[r];
      const prev = segs[segs.length - 1];
      if (prev?.kind === 'steady' && prev.power === powers[r][c]) prev.duration += duration;
      else segs.push({ kind: 'steady', power: powers[r][c], duration });
    }
    if (segs.length > DRAFT_LIMITS.segments) issues.push(`Column ${c + 2} (${header[c + 1]}): ${segs.length} power levels, above ${DRAFT_LIMITS.segments} per part.`);
    out[id] = segs;
  });
  return issues.length ? fail() : { parts: out, issues: [], end: times[times.length - 1] };
}
