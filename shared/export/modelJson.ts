/**
 * The model JSON file: the model document (shared/schemas/model.ts, SI units) with a `header`
 * first that states the units, the source variant and the caution. Reading validates with
 * modelSchema plus cross-checks, and answers a list of issues with field paths.
 */
import { z } from 'zod';
import { modelSchema, type Model } from '../schemas/model';
import { formatPath } from '../engine/errors';
import { checkModelReferences } from './modelChecks';
import { EXPORT_CAUTION, MODEL_UNITS, type ExportSource } from './units';

/** Header of an exported model file (ignored by the model schema itself). */
export interface ModelFileHeader {
  generator: 'Heatloom';
  exportedAt: string;
  units: typeof MODEL_UNITS;
  source: ExportSource;
  caution: string;
}

/** One problem of an imported file: dotted field path ('' = whole file) and a readable message. */
export interface ImportIssue {
  path: string;
  message: string;
}

/** Result of reading a model file. */
export type ModelFileRead = { ok: true; model: Model; header: Partial<ModelFileHeader> | null } | { ok: false; issues: ImportIssue[] };

/** Largest number of issues reported at once. */
export const MAX_ISSUES = 30;

/** The file as an object: header first, then the model document unchanged. */
export function modelFileObject(model: Model, source: ExportSource, exportedAt: Date): { header: ModelFileHeader } & Model {
  return { header: { generator: 'Heatloom', exportedAt: exportedAt.toISOString(), units: MODEL_UNITS, source, caution: EXPORT_CAUTION }, ...model };
}

/** The model as pretty-printed JSON text with its header. */
export function modelToJson(model: Model, source: ExportSource, exportedAt = new Date()): string {
  return JSON.stringify(modelFileObject(model, source, exportedAt), null, 2) + '\n';
}

const headerSchema = z
  .object({ units: z.record(z.string(), z.string()).optional(), source: z.object({ variant: z.string().optional() }).passthrough().optional() })
  .passthrough();

function unitIssues(header: z.infer<typeof headerSchema>): ImportIssue[] {
  const stated = header.units ?? {};
  return Object.entries(MODEL_UNITS)
    .filter(([key, unit]) => key in stated && stated[key] !== unit)
    .map(([key, unit]) => ({ path: `header.units.${key}`, message: `The file states ${key} in "${stated[key]}"; Heatloom model files use ${unit}. Convert the values first.` }));
}

/** Validate a parsed JSON value as a model file (header optional). */
export function readModelObject(value: unknown): ModelFileRead {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    return { ok: false, issues: [{ path: '', message: 'The file must hold one JSON object (a Heatloom model).' }] };
  }
  const raw = value as Record<string, unknown>;
  const issues: ImportIssue[] = [];
  let header: Partial<ModelFileHeader> | null = null;
  if (raw.header !== undefined) {
    const h = headerSchema.safeParse(raw.header);
    if (!h.success) issues.push({ path: 'header', message: 'The header is not an object with units and source.' });
    else {
      header = h.data as Partial<ModelFileHeader>;
      issues.push(...unitIssues(h.data));
    }
  }
  if (raw.format !== undefined && raw.format !== 'heatloom-model') issues.push({ path: 'format', message: `This is not a Heatloom model file (format "${String(raw.format)}").` });
  const { header: _ignored, ...body } = raw;
  const parsed = modelSchema.safeParse(body);
  if (!parsed.success) {
    for (const i of parsed.error.issues) {
      const path = formatPath(i.path);
      issues.push({ path, message: i.code === 'unrecognized_keys' ? `Unknown field(s): ${i.keys.join(', ')}.` : i.message });
    }
  } else issues.push(...checkModelReferences(parsed.data));
  if (issues.length || !parsed.success) return { ok: false, issues: issues.slice(0, MAX_ISSUES) };
  return { ok: true, model: parsed.data, header };
}

/** Parse model file text (JSON) and validate it. */
export function readModelFile(text: string): ModelFileRead {
  let value: unknown;
  try {
    value = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (e) {
    return { ok: false, issues: [{ path: '', message: `The file is not valid JSON: ${(e as Error).message}` }] };
  }
  return readModelObject(value);
}
