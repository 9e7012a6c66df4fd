/**
 * Junction hot spot of each part: mean junction temperature plus the largest local excess over the
 * footprint, where the excess is the planes' variation under the part passed through the column as a
 * 1-D divider (up path R_u, down path R_d: δT_j = (R_d·δT_lid + R_u·δT_interposer)/(R_u + R_d), no
 * extra spreading in the die — conservative) plus the part's own power-map non-uniformity from a flux
 * channel of its footprint holding the whole vertical stack.
 */
import type { Scenario } from '../../schemas/model';
import { defaultImpedanceCache, type ImpedanceCache } from '../cache';
import { nextPow2 } from '../field';
import type { Channel } from '../types';
import { plain } from './geometry';
import { loadOf } from './loads';
import type { AssemblyNetwork, NetworkState } from './network';
import { sampleMap, type PlacedMap } from './planeMaps';
import { powerMapField, rotateMap } from './powerMap';

/** The hot spot of one part (°C) and where it is (interposer coordinates, m). */
export interface HotSpot {
  value: number;
  x: number;
  y: number;
}

function upResistance(net: AssemblyNetwork, p: number): number | null {
  const col = net.columns[p];
  if (col.rUp === null) return null;
  return col.links.reduce((a, b) => a + b, 0) + col.rUp;
}

/**
 * Vertical stack of one part for its power-map spreading: everything above the junction (die, memory
 * bonds and tiers, TIM1, lid) to h_top and everything below (bumps, interposer, C4, substrate) to h_bottom,
 * cut to the part's footprint. Only non-uniform modes are used, for which the cut matters little.
 */
function localChannel(net: AssemblyNetwork, p: number): Channel {
  const g = net.geometry[p];
  const part = g.part;
  const up = [plain(part.die)];
  if (part.memory) for (let k = 0; k < part.memory.tiers; k++) up.push(plain(part.memory.bond), plain(part.memory.tier));
  const toLid = part.tim1 !== null && net.lid !== null;
  if (toLid) up.push(plain(part.tim1!), ...net.lid!.channel.above.layers);
  const below = net.interposer.channel.below;
  return {
    lx: g.footprint.width,
    ly: g.footprint.height,
    above: { layers: up, h: toLid ? net.lid!.channel.above.h : 0 },
    below: { layers: [plain(part.bumps), ...below.layers], h: below.h },
  };
}

/** Hot spot of every part for a solved state and its plane maps. */
export function hotSpots(
  net: AssemblyNetwork,
  state: NetworkState,
  scenario: Scenario,
  maps: { interposer: PlacedMap; lid: PlacedMap | null },
  cache: ImpedanceCache = defaultImpedanceCache,
): HotSpot[] {
  return net.geometry.map((g, p) => {
    const ru = upResistance(net, p);
    const rd = net.columns[p].rDown;
    const wLid = ru === null ? 0 : rd / (ru + rd);
    const wIp = 1 - wLid;
    const load = loadOf(scenario, g.part.id);
    const rotated = load.map ? rotateMap(load.map, g.part.rotation) : null;
    const gx = nextPow2(Math.max(32, 2 * (rotated?.nx ?? 0)));
    const gy = nextPow2(Math.max(32, 2 * (rotated?.ny ?? 0)));
    const own = rotated && load.power > 0 ? powerMapField(localChannel(net, p), rotated, load.power, gx, gy, cache) : null;
    const fp = g.footprint;
    const x0 = fp.x - fp.width / 2;
    const y0 = fp.y - fp.height / 2;
    const dx = fp.width / gx;
    const dy = fp.height / gy;
    const excess = new Float64Array(gx * gy);
    let meanIp = 0;
    let meanLid = 0;
    for (let iy = 0; iy < gy; iy++) {
      for (let ix = 0; ix < gx; ix++) {
        const x = x0 + (ix + 0.5) * dx;
        const y = y0 + (iy + 0.5) * dy;
        const ti = sampleMap(maps.interposer, x, y);
        const tl = maps.lid && wLid > 0 ? sampleMap(maps.lid, x, y) : 0;
        meanIp += ti;
        meanLid += tl;
        excess[iy * gx + ix] = wIp * ti + wLid * tl + (own ? own.values[iy * gx + ix] : 0);
      }
    }
    const base = (wIp * meanIp + wLid * meanLid) / (gx * gy);
    let best = 0;
    let at = (gy / 2) * gx + gx / 2;
    for (let i = 0; i < excess.length; i++) {
      if (excess[i] - base > best) {
        best = excess[i] - base;
        at = i;
      }
    }
    const tj = state.T[net.junctionNode[p]];
    return { value: tj + best, x: x0 + ((at % gx) + 0.5) * dx, y: y0 + (Math.floor(at / gx) + 0.5) * dy };
  });
}
