/** The one entry point of the flux-channel request: used by the HTTP route and the CLI alike. */
import { channelRequestSchema, type ChannelRequest, type ChannelResponse } from '../schemas/channel';
import { channelInfluence, meanRises } from './channel';
import { EngineInputError } from './errors';
import { fieldMap, modalTemperatures, nextPow2 } from './field';
import { uniformModeImpedances } from './impedance';
import { peaksOverRects } from './peak';
import type { Channel, ChannelLayer, RectSource } from './types';
import { parseOrThrow } from './zodIssues';

/** Largest map side used for the peak search. */
const PEAK_GRID_MAX = 512;

/** Request layers → engine layers (k → kxy = kz = k). */
export function toChannel(req: ChannelRequest): Channel {
  const layer = (l: ChannelRequest['above']['layers'][number]): ChannelLayer => ({
    thickness: l.thickness,
    kxy: (l.kxy ?? l.k)!,
    kz: (l.kz ?? l.k)!,
    contactResistance: l.contactResistance,
    rho: l.rho,
    cp: l.cp,
  });
  return {
    lx: req.footprint.x,
    ly: req.footprint.y,
    above: { layers: req.above.layers.map(layer), h: req.above.h },
    below: { layers: req.below.layers.map(layer), h: req.below.h },
  };
}

/** Validate a request body (unknown JSON) and solve it; throws EngineInputError on bad input. */
export function solveChannelRequest(body: unknown): ChannelResponse {
  const req = parseOrThrow(channelRequestSchema, body);
  const channel = toChannel(req);
  const sources: RectSource[] = req.sources.map((q) => ({ x: q.x, y: q.y, width: q.width, height: q.height }));
  const powers = req.sources.map((q) => q.power);
  const influence = channelInfluence(channel, sources, { truncation: req.truncation });
  const { m, n } = influence.truncation;
  const theta = modalTemperatures(influence.modes, powers);
  const minW = Math.min(...sources.map((q) => q.width));
  const minH = Math.min(...sources.map((q) => q.height));
  const gx = Math.min(PEAK_GRID_MAX, nextPow2(Math.max(64, (8 * channel.lx) / minW)));
  const gy = Math.min(PEAK_GRID_MAX, nextPow2(Math.max(64, (8 * channel.ly) / minH)));
  const searchMap = fieldMap(theta, m, n, channel.lx, channel.ly, gx, gy);
  const field = { theta, m, n, lx: channel.lx, ly: channel.ly };
  const peaks = peaksOverRects(field, searchMap, sources);
  const total = powers.reduce((a, b) => a + b, 0);
  const z = uniformModeImpedances(channel);
  const up = total * (z.total / z.up);
  const down = total * (z.total / z.down);
  if (!Number.isFinite(up + down)) throw new EngineInputError('above.h', 'The heat flow to the faces is not finite; check the face conductances.');
  const response: ChannelResponse = {
    matrix: influence.matrix,
    rise: meanRises(influence.flat, powers),
    peakRise: peaks.map((p) => p.value),
    peakAt: peaks.map((p) => ({ x: p.x, y: p.y })),
    truncation: influence.truncation,
    energyBalance: { power: total, up, down, relativeError: total > 0 ? Math.abs(up + down - total) / total : 0 },
  };
  if (req.map) {
    const map = fieldMap(theta, m, n, channel.lx, channel.ly, req.map.nx, req.map.ny);
    response.map = { nx: map.nx, ny: map.ny, dx: map.dx, dy: map.dy, values: Array.from(map.values) };
  }
  return response;
}
