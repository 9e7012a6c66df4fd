/**
 * Part columns (physics.md §2): each part is a 1-D ladder between its interposer footprint (down,
 * through the bumps) and its lid footprint (up, through die bulk and TIM1). A memory stack is a ladder
 * of nodes: base die (the junction) and N DRAM tiers joined by bond layers, each node with its own
 * power. A node sits at its die's bump-side (active) face; each node's heat capacity lumps its die and
 * the thin layer above it (the base node also the bumps): ρ·c_p·t·A.
 */
import type { Layer } from '../../schemas/model';
import { EngineInputError } from '../errors';
import type { PartGeometry } from './geometry';

/** One ladder node of a part column. */
export interface ColumnNode {
  partIndex: number;
  /** 0 = the die (memory: base die); 1 … N = DRAM tiers from the bottom up. */
  tier: number;
  /** Heat capacity (J/K); 0 when not needed (steady) — see columnOf. */
  capacitance: number;
}

/** A part column: its nodes, series resistances between them and to the two planes (K/W). */
export interface Column {
  partIndex: number;
  nodes: ColumnNode[];
  /** links[k] joins nodes[k] and nodes[k+1]. */
  links: number[];
  /** From nodes[0] through the bumps to the interposer plane. */
  rDown: number;
  /** From the last node through TIM1 to the lid plane; null without lid contact. */
  rUp: number | null;
}

const resistance = (l: Layer): number => l.thickness / l.kz + (l.contactResistance ?? 0);

function heat(l: Layer | null | undefined, area: number, needed: boolean, path: string): number {
  if (!l) return 0;
  if (l.rho === undefined || l.cp === undefined) {
    if (needed) throw new EngineInputError(path, 'This layer needs a density and a specific heat for a transient solve.');
    return 0;
  }
  return l.rho * l.cp * l.thickness * area;
}

/** Build the column of one part; heat capacities are required (and computed) only when withCapacity. */
export function columnOf(g: PartGeometry, withCapacity: boolean): Column {
  const { part, area, index } = g;
  const at = `parts[${index}]`;
  const rDown = resistance(part.bumps) / area;
  const timR = part.tim1 ? resistance(part.tim1) : null;
  const memory = part.memory;
  if (!memory) {
    const c = withCapacity
      ? heat(part.die, area, true, `${at}.die`) + heat(part.tim1, area, true, `${at}.tim1`) + heat(part.bumps, area, true, `${at}.bumps`)
      : 0;
    return {
      partIndex: index,
      nodes: [{ partIndex: index, tier: 0, capacitance: c }],
      links: [],
      rDown,
      rUp: timR === null ? null : (resistance(part.die) + timR) / area,
    };
  }
  const above = (k: number): Layer | null => (k < memory.tiers ? memory.bond : part.tim1);
  const nodes: ColumnNode[] = [];
  const links: number[] = [];
  for (let k = 0; k <= memory.tiers; k++) {
    const die = k === 0 ? part.die : memory.tier;
    let c = 0;
    if (withCapacity) {
      const diePath = k === 0 ? `${at}.die` : `${at}.memory.tier`;
      c = heat(die, area, true, diePath) + heat(above(k), area, true, k < memory.tiers ? `${at}.memory.bond` : `${at}.tim1`);
      if (k === 0) c += heat(part.bumps, area, true, `${at}.bumps`);
    }
    nodes.push({ partIndex: index, tier: k, capacitance: c });
    if (k < memory.tiers) links.push((resistance(die) + resistance(memory.bond)) / area);
  }
  return { partIndex: index, nodes, links, rDown, rUp: timR === null ? null : (resistance(memory.tier) + timR) / area };
}
