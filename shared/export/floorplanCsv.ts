/**
 * Floorplan CSV reader: one part per line with name, type, x, y, width, height, power. Lengths in mm
 * (x, y = the part's centre from the interposer's lower-left corner, as in the model), power in W.
 * Units may be stated in the header ("x (mm)"); other units are refused. Every problem names its line.
 */
import { partKinds, type PartKind } from '../schemas/model';
import { cellNumber, csvLines, type LineIssue } from './csv';

/** The header the app writes in its template and expects (units in parentheses). */
export const FLOORPLAN_HEADER = ['name', 'type', 'x (mm)', 'y (mm)', 'width (mm)', 'height (mm)', 'power (W)'] as const;

/** Most parts a floorplan may hold (the model's limit). */
export const FLOORPLAN_MAX_PARTS = 128;

/** One part read from a floorplan (SI: m, W) and the line it came from. */
export interface FloorplanPart {
  line: number;
  id: string;
  name: string;
  kind: PartKind;
  x: number;
  y: number;
  width: number;
  height: number;
  power: number;
}

/** What a floorplan CSV gave: the parts read, errors (nothing may be imported while any exist) and warnings. */
export interface FloorplanRead {
  parts: FloorplanPart[];
  errors: LineIssue[];
  warnings: LineIssue[];
}

type Column = 'name' | 'type' | 'x' | 'y' | 'width' | 'height' | 'power';
const aliases: Record<string, Column> = { name: 'name', type: 'type', kind: 'type', x: 'x', y: 'y', width: 'width', w: 'width', height: 'height', h: 'height', power: 'power', p: 'power' };
const units: Record<Column, string | null> = { name: null, type: null, x: 'mm', y: 'mm', width: 'mm', height: 'mm', power: 'w' };
const kindWords: Record<string, PartKind> = { chiplet: 'compute', logic: 'compute', 'i/o': 'io', 'io die': 'io', hbm: 'memory', dram: 'memory', 'memory stack': 'memory' };

/** A part id made from a name: letters, digits, _ . - only, unique among `taken`. */
export function idFromName(name: string, taken: Set<string>): string {
  const base = name.toLowerCase().replace(/[^a-z0-9_.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 34) || 'part';
  let id = base;
  for (let k = 2; taken.has(id); k++) id = `${base}-${k}`;
  taken.add(id);
  return id;
}

function readHeader(cells: string[], line: number, errors: LineIssue[], warnings: LineIssue[]): Map<Column, number> {
  const at = new Map<Column, number>();
  cells.forEach((cell, i) => {
    const m = /^([^(]*?)\s*(?:\(([^)]*)\))?$/.exec(cell.trim().toLowerCase());
    const col = m ? aliases[m[1].trim()] : undefined;
    if (!col) return void warnings.push({ line, column: cell, message: `Column "${cell}" is not used (known: ${FLOORPLAN_HEADER.join(', ')}).` });
    const unit = m?.[2]?.trim();
    if (unit && unit !== units[col]) errors.push({ line, column: cell, message: `Column "${cell}": ${col} must be given in ${units[col] === 'w' ? 'W' : units[col]}.` });
    if (at.has(col)) errors.push({ line, column: cell, message: `Column "${col}" appears twice.` });
    at.set(col, i);
  });
  for (const col of Object.keys(units) as Column[]) if (!at.has(col)) errors.push({ line, message: `The header has no "${col}" column.` });
  return at;
}

function readKind(word: string): PartKind | null {
  const w = word.trim().toLowerCase();
  return (partKinds as readonly string[]).includes(w) ? (w as PartKind) : (kindWords[w] ?? null);
}

/** Read a floorplan CSV (header row first). */
export function readFloorplanCsv(text: string): FloorplanRead {
  const errors: LineIssue[] = [];
  const warnings: LineIssue[] = [];
  const parts: FloorplanPart[] = [];
  const lines = csvLines(text);
  if (!lines.length) return { parts, errors: [{ line: 0, message: 'The file is empty.' }], warnings };
  const [head, ...rows] = lines;
  const at = readHeader(head.cells, head.line, errors, warnings);
  if (errors.length) return { parts, errors, warnings };
  if (rows.length > FLOORPLAN_MAX_PARTS) errors.push({ line: rows[FLOORPLAN_MAX_PARTS].line, message: `At most ${FLOORPLAN_MAX_PARTS} parts.` });
  const ids = new Set<string>();
  const names = new Map<string, number>();
  for (const { line, cells } of rows.slice(0, FLOORPLAN_MAX_PARTS)) {
    const get = (c: Column) => cells[at.get(c)!] ?? '';
    const bad = (column: Column, message: string) => errors.push({ line, column, message });
    const name = get('name');
    if (!name) bad('name', 'The name is empty.');
    else if (name.length > 80) bad('name', 'The name is longer than 80 characters.');
    else if (names.has(name.toLowerCase())) bad('name', `"${name}" is already used on line ${names.get(name.toLowerCase())}.`);
    const kind = readKind(get('type'));
    if (!kind) bad('type', `Unknown type "${get('type')}" (use ${partKinds.join(', ')}).`);
    const num = (c: Column, min: number, max: number, what: string): number => {
      const v = cellNumber(get(c));
      if (v === null) bad(c, `${c} "${get(c)}" is not a number.`);
      else if (v < min || v > max) bad(c, `${c} = ${v} is outside ${min} … ${max} ${what}.`);
      return v ?? NaN;
    };
    const x = num('x', -300, 300, 'mm');
    const y = num('y', -300, 300, 'mm');
    const width = num('width', 0.01, 200, 'mm');
    const height = num('height', 0.01, 200, 'mm');
    const power = num('power', 0, 5000, 'W');
    if (kind && (kind === 'bridge' || kind === 'passive') && power > 0) warnings.push({ line, column: 'power', message: `A ${kind} is unpowered in the model; its ${power} W is still applied.` });
    if (name) names.set(name.toLowerCase(), line);
    if (errors.some((e) => e.line === line)) continue;
    parts.push({ line, id: idFromName(name, ids), name, kind: kind!, x: x / 1000, y: y / 1000, width: width / 1000, height: height / 1000, power });
  }
  if (!rows.length) errors.push({ line: head.line, message: 'The file has a header but no parts.' });
  return { parts, errors, warnings };
}
