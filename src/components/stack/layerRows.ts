/** The rows of the layer table: the shared stack-up (lid, interposer, C4, substrate) and the selected parts' own layers. */
import type { Layer, Model, Part } from '@shared/schemas/model';

/** Where a row's layer lives in the model: read it, write it into a draft, and list edits. */
export interface LayerRow {
  key: string;
  group: string;
  label: string;
  /** Colour role for the drawing and the row swatch. */
  role: 'lid' | 'tim' | 'die' | 'tier' | 'bond' | 'bumps' | 'interposer' | 'c4' | 'substrate';
  get: (m: Model) => Layer | null;
  set: (draft: Model, layer: Layer) => void;
  /** For TIM1 only: remove the layer (the part no longer touches the lid). */
  clear?: (draft: Model) => void;
  /** For layers in a list: the list in a draft and the index (add below / remove). */
  list?: { of: (draft: Model) => Layer[]; index: number; min: number; max: number };
}

type ListKey = 'lid' | 'interposer' | 'substrate';
const listLimits: Record<ListKey, number> = { lid: 5, interposer: 10, substrate: 20 };

function listRows(m: Model, which: ListKey, group: string, role: LayerRow['role']): LayerRow[] {
  const of = (d: Model) => d.stack[which].layers;
  return m.stack[which].layers.map((l, i) => ({
    key: `${which}.${i}`,
    group,
    label: l.name ?? `${group} ${i + 1}`,
    role,
    get: (x) => x.stack[which].layers[i] ?? null,
    set: (d, layer) => { d.stack[which].layers[i] = layer; },
    list: { of, index: i, min: 1, max: listLimits[which] },
  }));
}

type PartSlot = 'die' | 'tim1' | 'bumps' | 'tier' | 'bond';
const slotLabel: Record<PartSlot, string> = { die: 'Die (base die for memory)', tim1: 'TIM1 (part to lid)', bumps: 'Microbumps + underfill', tier: 'DRAM tier (each)', bond: 'Tier bond (each)' };
const slotRole: Record<PartSlot, LayerRow['role']> = { die: 'die', tim1: 'tim', bumps: 'bumps', tier: 'tier', bond: 'bond' };

function partLayer(p: Part, slot: PartSlot): Layer | null {
  if (slot === 'tier' || slot === 'bond') return p.memory?.[slot] ?? null;
  return p[slot];
}

/** All rows for the model; part rows follow the first selected part and write to every selected part. */
export function layerRows(m: Model, selection: string[]): LayerRow[] {
  const rows: LayerRow[] = [
    ...listRows(m, 'lid', 'Lid', 'lid'),
    ...listRows(m, 'interposer', 'Interposer', 'interposer'),
    { key: 'c4', group: 'C4', label: m.stack.c4.name ?? 'C4 bumps + underfill', role: 'c4', get: (x) => x.stack.c4, set: (d, l) => { d.stack.c4 = l; } },
    ...listRows(m, 'substrate', 'Substrate', 'substrate'),
  ];
  const parts = m.parts.filter((p) => selection.includes(p.id));
  if (!parts.length) return rows;
  const first = parts[0];
  const group = parts.length === 1 ? `Part: ${first.name}` : `Parts: ${parts.length} selected`;
  const slots: PartSlot[] = first.memory ? ['tim1', 'tier', 'bond', 'die', 'bumps'] : ['tim1', 'die', 'bumps'];
  for (const slot of slots) {
    rows.push({
      key: `part.${slot}`,
      group,
      label: slotLabel[slot],
      role: slotRole[slot],
      get: (x) => { const p = x.parts.find((q) => q.id === first.id); return p ? partLayer(p, slot) : null; },
      set: (d, layer) => {
        for (const p of d.parts) {
          if (!selection.includes(p.id)) continue;
          if (slot === 'tier' || slot === 'bond') { if (p.memory) p.memory[slot] = structuredClone(layer); } else p[slot] = structuredClone(layer);
        }
      },
      clear: slot === 'tim1' ? (d) => { for (const p of d.parts) if (selection.includes(p.id)) p.tim1 = null; } : undefined,
    });
  }
  return rows;
}
