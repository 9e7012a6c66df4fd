/** Request and response shapes of the import/export routes (server/api/io; docs in the route comments). */
import { z } from 'zod';
import { nameSchema, noteSchema } from '../schemas/common';
import type { PowerMap } from '../schemas/model';
import type { LineIssue } from './csv';
import type { FloorplanPart } from './floorplanCsv';

/** Largest upload (bytes) for any import. */
export const UPLOAD_LIMIT_BYTES = 2 * 1024 * 1024;

/** Query of the matrix CSV export. */
export const matrixQuerySchema = z.object({
  kind: z.enum(['influence', 'nodes', 'contribution']).default('influence'),
  scenario: z.string().max(40).optional(),
});

/** Query of the temperatures CSV and netlist exports: one scenario (all scenarios for the CSV when absent). */
export const scenarioQuerySchema = z.object({ scenario: z.string().max(40).optional() });

/** Query of the netlist export: the scenario its sources hold, and Foster (auto: when the transient exists) or steady. */
export const netlistQuerySchema = z.object({ scenario: z.string().max(40).optional(), model: z.enum(['auto', 'steady', 'foster']).default('auto') });

/** POST /api/assemblies/:aid/import as JSON: the model file as an object (or its text), and the new variant's name. */
export const modelImportSchema = z.object({
  name: nameSchema.optional(),
  note: noteSchema,
  model: z.unknown().optional(),
  text: z.string().max(UPLOAD_LIMIT_BYTES).optional(),
});

/** POST /api/assemblies/:aid/import/floorplan as JSON: CSV text, the variant it starts from (default: the assembly's first) and a name. */
export const floorplanImportSchema = z.object({
  name: nameSchema.optional(),
  note: noteSchema,
  csv: z.string().max(UPLOAD_LIMIT_BYTES).optional(),
  baseVariantId: z.coerce.number().int().positive().optional(),
});

/** POST /api/import/floorplan/preview and /api/import/power-map as JSON. */
export const csvPreviewSchema = z.object({ csv: z.string().max(UPLOAD_LIMIT_BYTES).optional() });

/** Answer of the floorplan preview (SI units in `parts`; the UI shows mm). */
export interface FloorplanPreview {
  parts: FloorplanPart[];
  errors: LineIssue[];
  warnings: LineIssue[];
}

/** Answer of the power-map reader. */
export interface PowerMapPreview {
  map: PowerMap | null;
  errors: LineIssue[];
}
