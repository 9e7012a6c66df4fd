/** Solve a model document given as unknown JSON (CLI, import checks): validate, then solveAssembly. */
import { modelSchema } from '../../schemas/model';
import { parseOrThrow } from '../zodIssues';
import { solveAssembly, type AssemblyOptions } from './solve';
import type { AssemblyResult } from './result';

/** Validate `body` as a model document (EngineInputError with field paths) and solve one scenario. */
export function solveModelDocument(body: unknown, scenarioId?: string, options: AssemblyOptions = {}): AssemblyResult {
  return solveAssembly(parseOrThrow(modelSchema, body), scenarioId, options);
}
