/** Plausibility checks of a channel and its sources before any modal sum (typed errors with field paths). */
import { EngineInputError } from './errors';
import type { Channel, ChannelStack, RectSource } from './types';

const positiveFinite = (v: number): boolean => Number.isFinite(v) && v > 0;

function checkStack(stack: ChannelStack, path: string): void {
  if (!(Number.isFinite(stack.h) && stack.h >= 0)) {
    throw new EngineInputError(`${path}.h`, 'The face conductance h must be a finite number ≥ 0 W/m²K (0 means adiabatic).');
  }
  stack.layers.forEach((layer, i) => {
    const at = `${path}.layers[${i}]`;
    if (!positiveFinite(layer.thickness)) throw new EngineInputError(`${at}.thickness`, 'A layer thickness must be a finite number greater than 0 m.');
    if (!positiveFinite(layer.kxy)) throw new EngineInputError(`${at}.kxy`, 'The in-plane conductivity must be a finite number greater than 0 W/m·K.');
    if (!positiveFinite(layer.kz)) throw new EngineInputError(`${at}.kz`, 'The through-plane conductivity must be a finite number greater than 0 W/m·K.');
    const r = layer.contactResistance ?? 0;
    if (!(Number.isFinite(r) && r >= 0)) throw new EngineInputError(`${at}.contactResistance`, 'A contact resistance must be a finite number ≥ 0 m²K/W.');
  });
}

/** Throw EngineInputError unless the channel is physical and every source lies inside its footprint (floating: both faces may be adiabatic). */
export function checkChannel(channel: Channel, sources: readonly RectSource[], sourcePath = 'sources', floating = false): void {
  if (!positiveFinite(channel.lx)) throw new EngineInputError('footprint.x', 'The footprint length along x must be greater than 0 m.');
  if (!positiveFinite(channel.ly)) throw new EngineInputError('footprint.y', 'The footprint length along y must be greater than 0 m.');
  checkStack(channel.above, 'above');
  checkStack(channel.below, 'below');
  if (!floating && channel.above.h === 0 && channel.below.h === 0) {
    throw new EngineInputError('above.h', 'Both faces are adiabatic (h = 0): the heat has nowhere to go and no steady state exists. Give the top or bottom face a conductance h > 0.');
  }
  if (sources.length === 0) throw new EngineInputError(sourcePath, 'At least one source rectangle is needed.');
  const tol = 1e-12 * Math.max(channel.lx, channel.ly);
  sources.forEach((q, i) => {
    const at = `${sourcePath}[${i}]`;
    if (![q.x, q.y].every(Number.isFinite)) throw new EngineInputError(at, 'A source centre must be finite numbers (m).');
    if (!positiveFinite(q.width) || !positiveFinite(q.height)) throw new EngineInputError(at, 'A source width and height must be greater than 0 m.');
    const inside =
      q.x - q.width / 2 >= -tol && q.x + q.width / 2 <= channel.lx + tol && q.y - q.height / 2 >= -tol && q.y + q.height / 2 <= channel.ly + tol;
    if (!inside) {
      throw new EngineInputError(at, `Source ${i + 1} reaches outside the ${fmtMm(channel.lx)} × ${fmtMm(channel.ly)} mm footprint; move or shrink it.`);
    }
  });
}

/** Metres as a short mm string. */
export function fmtMm(v: number): string {
  return String(Number((v * 1000).toPrecision(4)));
}
