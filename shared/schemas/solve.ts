/** Stored analysis requests and responses. */
import { z } from 'zod';

/** POST /api/variants/:vid/solve body (and GET …/results query): the scenario to solve; the model's first when absent. */
export const variantSolveSchema = z.object({ scenarioId: z.string().min(1).max(40).optional() });
export type VariantSolve = z.infer<typeof variantSolveSchema>;

/** A stored (or freshly computed) result of one scenario of one variant version. */
export const storedResultSchema = z.object({
  variantId: z.number().int(),
  version: z.number().int(),
  scenarioId: z.string(),
  kind: z.string(),
  inputHash: z.string(),
  cached: z.boolean(),
  createdAt: z.string(),
  result: z.unknown(),
});
export type StoredResult = z.infer<typeof storedResultSchema>;
