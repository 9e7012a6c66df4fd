/**
 * Heat-sink resistance to an effective film conductance: h = 1/(R·A), from R = 1/(h·A) for a
 * uniform conductance over area A (Incropera et al., Fundamentals of Heat and Mass Transfer,
 * 7th ed., §3.1.3, convection resistance).
 */
import { coolingSchema, type Cooling, type Model } from '@shared/schemas/model';

/** Cooled side of the assembly. */
export type Side = 'top' | 'bottom';

/** h (W/m²K) equivalent to a sink resistance R (K/W) spread over area A (m²). */
export const hFromSink = (R: number, A: number): number => 1 / (R * A);

/** Area (m²) the conversion uses when none is given: the lid's top face, or the substrate's underside for the board side. */
export function defaultSinkArea(model: Model, side: Side): number {
  const f = side === 'top' ? model.stack.lid : model.stack.substrate;
  return f.width * f.height;
}

/** The cooling record for a sink (h derived; the board side keeps its area explicit). */
export function sinkCooling(model: Model, side: Side, c: Cooling, R: number, area?: number): Cooling {
  const A = area ?? defaultSinkArea(model, side);
  const out: Cooling = { ...c, sinkResistance: R, h: hFromSink(R, A) };
  if (area !== undefined || side === 'bottom') out.sinkArea = A;
  else delete out.sinkArea;
  return out;
}

/** The cooling record for a plain h (sink fields dropped). */
export function filmCooling(c: Cooling, h: number): Cooling {
  return { h, fluidTemperature: c.fluidTemperature };
}

/** Validate a candidate cooling record; the first problem as text, or the parsed record. */
export function checkCooling(c: unknown): { ok: true; value: Cooling } | { ok: false; field: string; message: string } {
  const r = coolingSchema.safeParse(c);
  if (r.success) return { ok: true, value: r.data };
  const i = r.error.issues[0];
  const field = String(i.path[0] ?? '');
  const lim = i.code === 'too_big' ? `at most ${i.maximum}` : i.code === 'too_small' ? `must be ${i.inclusive ? 'at least' : 'more than'} ${i.minimum}` : i.message;
  return { ok: false, field, message: `${lim} (SI units)` };
}
