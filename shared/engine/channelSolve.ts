/** The channel route's and CLI's one entry: the steady response, plus the impedance matrices when `times` are asked. */
import { solveChannelRequest } from './channelRequest';
import { solveChannelTransient } from './transient/channelImpedance';

/** Steady channel response; with `times` (and ρ, c_p on every layer) also `impedance[k][j][i]` in K/W. */
export function solveChannelBody(body: unknown) {
  const steady = solveChannelRequest(body);
  const times = (body as { times?: unknown } | null)?.times;
  if (!Array.isArray(times)) return steady;
  const transient = solveChannelTransient(body);
  return { ...steady, times: transient.times, impedance: transient.impedance };
}
