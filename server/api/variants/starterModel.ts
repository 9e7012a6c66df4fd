/** The model a variant starts from in an assembly that has none yet: the demo stack-up, no parts, one empty scenario. */
import { modelSchema, type Model } from '@shared/schemas/model';
import { lx9Stack } from '@shared/demo/lx9';

/** A valid empty model to place parts into. */
export function starterModel(): Model {
  return modelSchema.parse({ stack: lx9Stack(), parts: [], scenarios: [{ id: 'idle', name: 'Idle', loads: {} }] });
}
