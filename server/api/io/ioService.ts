/** Import/export logic: solves for the CSV and netlist exports, validation of imports before anything is saved. */
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { EngineInputError } from '@shared/engine/errors';
import {
  floorplanToModel, matrixCsv, modelToJson, readFloorplanCsv, readModelFile, readModelObject, temperaturesCsv,
  type MatrixKind,
} from '@shared/export';
import type { VariantDetail } from '@shared/schemas/variants';
import type { Access } from '../../lib/permissions';
import { NotFoundError, ValidationError } from '../../lib/errors';
import * as variantsService from '../variants/variantsService';
import { resultForExport } from '../solve/solveService';
import { runEngineTask } from '../../lib/workerPool';
import * as repo from './ioRepository';
import type { NetlistKind } from './netlistModel';

async function stored(id: number): Promise<repo.StoredVariant> {
  const v = await repo.loadVariant(id);
  if (!v) throw new NotFoundError('Variant');
  return v;
}

/** Run an export's engine work (on the worker pool); engine input errors become 400 validation errors naming the fields. */
async function engine<T>(run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (e) {
    if (e instanceof EngineInputError) throw new ValidationError(e.issues.map((i) => ({ path: i.path, message: i.message })), e.message);
    throw e;
  }
}

/** One scenario's result for an export: the stored solve when there is one, else computed off the HTTP thread. */
function solve(v: repo.StoredVariant, scenario: string | undefined): Promise<AssemblyResult> {
  return engine(() => resultForExport(v.id, v.model, scenario));
}

/** A file name stem from the variant's name: lower case letters, digits and dashes. */
export function fileStem(v: repo.StoredVariant): string {
  return (v.source.variant ?? `variant-${v.id}`).toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || `variant-${v.id}`;
}

/** The model JSON file of a variant. */
export async function modelFile(id: number): Promise<{ stem: string; body: string }> {
  const v = await stored(id);
  return { stem: fileStem(v), body: modelToJson(v.model, v.source) };
}

/** A matrix CSV of one scenario (the first when absent). */
export async function matrixFile(id: number, kind: MatrixKind, scenario?: string): Promise<{ stem: string; body: string }> {
  const v = await stored(id);
  return { stem: fileStem(v), body: matrixCsv(await solve(v, scenario), kind) };
}

/** The temperature table of one scenario, or of every scenario when absent. */
export async function temperaturesFile(id: number, scenario?: string): Promise<{ stem: string; body: string }> {
  const v = await stored(id);
  const ids = scenario ? [scenario] : v.model.scenarios.map((s) => s.id);
  return { stem: fileStem(v), body: temperaturesCsv(await Promise.all(ids.map((s) => solve(v, s)))) };
}

/** The SPICE netlist of the compact model for one scenario: Foster network when the transient exists (kind auto), else the steady matrix. */
export async function netlistFile(id: number, scenario: string | undefined, kind: NetlistKind): Promise<{ stem: string; body: string }> {
  const v = await stored(id);
  const body = await engine(() => runEngineTask<string>({ kind: 'netlist', model: v.model, scenarioId: scenario, netlist: kind, source: v.source }));
  return { stem: fileStem(v), body };
}

function issuesError(issues: { path: string; message: string }[], what: string): ValidationError {
  return new ValidationError(issues, `The ${what} cannot be imported: ${issues.length} problem(s) found. Nothing was saved.`);
}

/** Validate a model file (text or parsed object) and store it as a new variant of the assembly. */
export async function importModel(a: Access, input: { text?: string | null; model?: unknown; name?: string; note: string; filename?: string | null }): Promise<VariantDetail> {
  if (input.text == null && input.model === undefined) throw new ValidationError([{ path: 'file', message: 'Attach a model file (.json).' }]);
  const read = input.text != null ? readModelFile(input.text) : readModelObject(input.model);
  if (!read.ok) throw issuesError(read.issues, 'model file');
  const from = read.header?.source;
  const name = input.name ?? (from?.variant ? `${from.variant} (imported)`.slice(0, 120) : 'Imported variant');
  const origin = input.filename ? `file ${input.filename}` : 'a model file';
  const id = await repo.insertImported(
    { assemblyId: a.assemblyId!, projectId: a.projectId!, userId: a.userId },
    { name, note: input.note, model: read.model, summary: `imported variant "${name}" from ${origin}` },
  );
  return variantsService.detail(a, id);
}

/** Validate a floorplan CSV, apply it to a base variant of the assembly and store the result as a new variant. */
export async function importFloorplan(a: Access, input: { csv?: string | null; name?: string; note: string; baseVariantId?: number; filename?: string | null }): Promise<VariantDetail> {
  if (input.csv == null) throw new ValidationError([{ path: 'file', message: 'Attach a floorplan file (.csv).' }]);
  const plan = readFloorplanCsv(input.csv);
  if (plan.errors.length) throw issuesError(plan.errors.slice(0, 50).map((e) => ({ path: `line ${e.line}${e.column ? `, ${e.column}` : ''}`, message: e.message })), 'floorplan');
  const base = await repo.baseModel(a.assemblyId!, input.baseVariantId);
  if (!base) throw new NotFoundError('Base variant');
  const model = floorplanToModel(base, plan.parts);
  const name = input.name ?? 'Floorplan import';
  const id = await repo.insertImported(
    { assemblyId: a.assemblyId!, projectId: a.projectId!, userId: a.userId },
    { name, note: input.note, model, summary: `imported variant "${name}" from floorplan ${input.filename ?? 'CSV'} (${plan.parts.length} parts)` },
  );
  return variantsService.detail(a, id);
}
