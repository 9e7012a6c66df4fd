/**
 * The assembly as a network of two spreading planes and part columns (physics.md §2), solved directly:
 * unknowns are the column node temperatures, the heat each column gives to the lid plane and to the
 * interposer plane, and the mean level of a plane whose faces are both adiabatic. Plane rows state
 * T_plane = T_fluid + G·q (G from the flux channel), node rows the heat balance (+ s·C·T in Laplace).
 */
import type { Model } from '../../schemas/model';
import type { ImpedanceCache } from '../cache';
import { EngineInputError } from '../errors';
import { channelInfluence, type ChannelModes } from '../channel';
import { luFactor, luSolve, type LuFactors } from '../linear';
import type { Channel, Truncation } from '../types';
import { columnOf, type Column, type ColumnNode } from './columns';
import { interposerChannel, lidChannel, partGeometries, type PartGeometry } from './geometry';

/** Options of the network build. */
export interface NetworkOptions {
  /** Real Laplace variable s ≥ 0 (1/s); 0 = steady. With s > 0 every layer needs rho and cp. */
  s?: number;
  /** Fixed truncations per plane (automatic when absent). */
  truncation?: { lid?: Truncation; interposer?: Truncation };
  cache?: ImpedanceCache | null;
}

/** One spreading plane: its channel, modal data, influence matrix and the parts that feed it. */
export interface Plane {
  channel: Channel;
  modes: ChannelModes;
  /** Influence matrix over `parts` (K/W), row-major. */
  flat: Float64Array;
  /** Part indices in plane order. */
  parts: number[];
  /** Both faces adiabatic: rises are relative to an unknown mean level, net heat zero. */
  floating: boolean;
  /** Fluid temperature of its cooled face (°C). */
  fluid: number;
}

/** The solved-once network: factors, node-level influence matrix and fluid offsets. */
export interface AssemblyNetwork {
  s: number;
  geometry: PartGeometry[];
  columns: Column[];
  /** All ladder nodes, part by part (a part's first node is its junction). */
  nodes: ColumnNode[];
  /** Index of each part's junction node in `nodes`. */
  junctionNode: number[];
  lid: Plane | null;
  interposer: Plane;
  /** R[j·nodes + i]: rise of node j per W at node i (K/W; symmetric). */
  R: Float64Array;
  /** Node temperatures at zero power (°C) — the fluid offsets; zeros when s > 0. */
  offsets: Float64Array;
  factors: LuFactors;
  /** Unknown index of each floating plane's mean level (−1 when the plane is cooled or absent). */
  levels: { lid: number; interposer: number };
}

/** Temperatures and heat flows of one network solve. */
export interface NetworkState {
  /** Node temperatures (°C; rises when s > 0). */
  T: Float64Array;
  /** Heat from each part's column into the lid plane / interposer plane (W). */
  qUp: Float64Array;
  qDown: Float64Array;
  /** Base level of each plane's field (°C): its fluid, or the solved mean level when floating. */
  lidLevel: number;
  interposerLevel: number;
}

function buildPlane(channel: Channel, parts: number[], sources: PartGeometry['footprint'][], fluid: number, s: number, options: NetworkOptions, which: 'lid' | 'interposer'): Plane {
  const floating = s === 0 && channel.above.h === 0 && channel.below.h === 0;
  const inf = channelInfluence(channel, sources, { s, floating, truncation: options.truncation?.[which], cache: options.cache });
  return { channel, modes: inf.modes, flat: inf.flat, parts, floating, fluid };
}

/** Build, factor and characterise the network of a model (does not depend on any scenario). */
export function assemblyNetwork(model: Model, options: NetworkOptions = {}): AssemblyNetwork {
  const s = options.s ?? 0;
  const geometry = partGeometries(model);
  const columns = geometry.map((g) => columnOf(g, s > 0));
  const nodes = columns.flatMap((c) => c.nodes);
  const junctionNode: number[] = [];
  columns.reduce((start, c) => (junctionNode.push(start), start + c.nodes.length), 0);
  const lidParts = geometry.filter((g) => g.lidFootprint).map((g) => g.index);
  const fluids = model.stack.cooling;
  const lid = lidParts.length
    ? buildPlane(lidChannel(model), lidParts, lidParts.map((i) => geometry[i].lidFootprint!), fluids.top.fluidTemperature, s, options, 'lid')
    : null;
  const interposer = buildPlane(interposerChannel(model), geometry.map((g) => g.index), geometry.map((g) => g.footprint), fluids.bottom.fluidTemperature, s, options, 'interposer');
  if (interposer.floating && (!lid || lid.floating)) {
    throw new EngineInputError('stack.cooling', 'Neither the lid side nor the board side is cooled (h = 0 on both): no steady state exists.');
  }
  const system = assemble(columns, nodes.length, junctionNode, lid, interposer, s);
  const factors = luFactor(system.matrix, system.size);
  const nn = nodes.length;
  const R = new Float64Array(nn * nn);
  const rhs = new Float64Array(system.size);
  for (let i = 0; i < nn; i++) {
    rhs.fill(0);
    rhs[i] = 1;
    const x = luSolve(factors, rhs);
    for (let j = 0; j < nn; j++) R[j * nn + i] = x[j];
  }
  const offsets = s === 0 ? luSolve(factors, fluidRhs(system.size, nn, lid, interposer)).slice(0, nn) : new Float64Array(nn);
  return { s, geometry, columns, nodes, junctionNode, lid, interposer, R, offsets, factors, levels: system.levels };
}

/** Solve the network for node powers (W); fluid temperatures included when s = 0. */
export function solveNetwork(net: AssemblyNetwork, nodePowers: ArrayLike<number>): NetworkState {
  const nn = net.nodes.length;
  const b = net.s === 0 ? fluidRhs(net.factors.size, nn, net.lid, net.interposer) : new Float64Array(net.factors.size);
  for (let i = 0; i < nn; i++) b[i] += nodePowers[i];
  const x = luSolve(net.factors, b);
  const qUp = new Float64Array(net.geometry.length);
  const qDown = new Float64Array(net.geometry.length);
  const nl = net.lid ? net.lid.parts.length : 0;
  net.lid?.parts.forEach((p, k) => (qUp[p] = x[nn + k]));
  net.interposer.parts.forEach((p, k) => (qDown[p] = x[nn + nl + k]));
  const level = (plane: Plane | null, index: number): number => (index >= 0 ? x[index] : net.s === 0 && plane ? plane.fluid : 0);
  return { T: x.slice(0, nn), qUp, qDown, lidLevel: level(net.lid, net.levels.lid), interposerLevel: level(net.interposer, net.levels.interposer) };
}

function fluidRhs(size: number, nn: number, lid: Plane | null, ip: Plane): Float64Array {
  const b = new Float64Array(size);
  const nl = lid ? lid.parts.length : 0;
  if (lid && !lid.floating) for (let k = 0; k < nl; k++) b[nn + k] = lid.fluid;
  if (!ip.floating) for (let k = 0; k < ip.parts.length; k++) b[nn + nl + k] = ip.fluid;
  return b;
}

interface System {
  matrix: Float64Array;
  size: number;
  levels: { lid: number; interposer: number };
}

function assemble(columns: Column[], nn: number, junction: number[], lid: Plane | null, ip: Plane, s: number): System {
  const nl = lid ? lid.parts.length : 0;
  const np = ip.parts.length;
  const lidLevel = lid?.floating ? nn + nl + np : -1;
  const ipLevel = ip.floating ? nn + nl + np + (lidLevel >= 0 ? 1 : 0) : -1;
  const size = nn + nl + np + (lidLevel >= 0 ? 1 : 0) + (ipLevel >= 0 ? 1 : 0);
  const a = new Float64Array(size * size);
  const add = (r: number, c: number, v: number): void => void (a[r * size + c] += v);
  columns.forEach((col, p) => {
    const first = junction[p];
    col.nodes.forEach((node, k) => add(first + k, first + k, s * node.capacitance));
    col.links.forEach((r, k) => {
      const g = 1 / r;
      add(first + k, first + k, g);
      add(first + k + 1, first + k + 1, g);
      add(first + k, first + k + 1, -g);
      add(first + k + 1, first + k, -g);
    });
  });
  const planeRows = (plane: Plane, offset: number, level: number, up: boolean): void => {
    const n = plane.parts.length;
    plane.parts.forEach((p, k) => {
      const col = columns[p];
      const node = junction[p] + (up ? col.nodes.length - 1 : 0);
      const row = offset + k;
      add(node, row, 1);
      add(row, node, 1);
      add(row, row, -(up ? col.rUp! : col.rDown));
      for (let l = 0; l < n; l++) add(row, offset + l, -plane.flat[k * n + l]);
      if (level >= 0) {
        add(row, level, -1);
        add(level, row, 1);
      }
    });
  };
  if (lid) planeRows(lid, nn, lidLevel, true);
  planeRows(ip, nn + nl, ipLevel, false);
  return { matrix: a, size, levels: { lid: lidLevel, interposer: ipLevel } };
}
