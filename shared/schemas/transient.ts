/** Bodies of the stored transient analyses of a variant: timeline of a scenario's profile, timing answers. */
import { z } from 'zod';

const id = z.string().min(1).max(40);
const celsius = z.number().finite().gte(-60).lte(400);

/** POST /api/variants/:vid/timeline body. */
export const timelineRequestSchema = z.object({
  scenarioId: id.optional(),
  /** Evaluate leakage and Joule power at each step (P(T)). */
  feedback: z.boolean().default(false),
}).strict();
export type TimelineRequest = z.infer<typeof timelineRequestSchema>;

/** POST /api/variants/:vid/timing body: boost a part from a state, rest it, and find the duty cycle at a period. */
export const timingRequestSchema = z.object({
  partId: id,
  scenarioId: id.optional(),
  boostPower: z.number().finite().gte(0).lte(5000),
  restPower: z.number().finite().gte(0).lte(5000).optional(),
  limit: celsius.optional(),
  reenable: celsius.optional(),
  /** 'ambient' or a scenario id whose steady state is the start. */
  startFrom: id.optional(),
  /** Period (s) for the highest duty cycle. */
  period: z.number().finite().gt(0).lte(1e4).optional(),
}).strict();
export type TimingRequest = z.infer<typeof timingRequestSchema>;
