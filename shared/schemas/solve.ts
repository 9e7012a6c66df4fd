/** Stored analysis requests and responses. */
import { z } from 'zod';

/**
 * POST /api/variants/:vid/solve body: the scenario to solve (the model's first when absent) and whether
 * the answer carries the two plane maps (about 600 KB of the demo's 640 KB answer; default false: `result.maps` is null).
 */
export const variantSolveSchema = z.object({
  scenarioId: z.string().min(1).max(40).optional(),
  maps: z.boolean().optional(),
});
export type VariantSolve = z.infer<typeof variantSolveSchema>;

/** GET /api/variants/:vid/results query: as the solve body, with `maps` written true/false or 1/0. */
export const variantResultsQuerySchema = z.object({
  scenarioId: z.string().min(1).max(40).optional(),
  maps: z.enum(['true', 'false', '1', '0']).optional().transform((v) => v === 'true' || v === '1'),
});

/** A stored (or freshly computed) result of one scenario of one variant version. */
export const storedResultSchema = z.object({
  variantId: z.number().int(),
  version: z.number().int(),
  scenarioId: z.string(),
  kind: z.string(),
  inputHash: z.string(),
  cached: z.boolean(),
  createdAt: z.string(),
  /** True when `result.maps` holds the plane maps; false when they were left out (ask again with `maps: true`). */
  mapsIncluded: z.boolean(),
  result: z.unknown(),
});
export type StoredResult = z.infer<typeof storedResultSchema>;
