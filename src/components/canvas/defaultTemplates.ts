/**
 * Built-in part templates used when the workspace library has none: sizes from the invented LX-9 demo
 * (product.md): compute 13 × 15 mm, I/O die 8 × 10 mm, memory stack 11 × 10 mm with 8 tiers; layers
 * and limits are the shared per-kind defaults (shared/export/floorplanDefaults.ts, sources named there).
 */
import type { PartKind } from '@shared/schemas/model';
import type { PartTemplate } from '@shared/schemas/library';
import { FLOORPLAN_DEFAULTS } from '@shared/export/floorplanDefaults';

const sizes: Record<PartKind, { name: string; width: number; height: number }> = {
  compute: { name: 'Compute chiplet', width: 0.013, height: 0.015 },
  io: { name: 'I/O die', width: 0.008, height: 0.01 },
  memory: { name: 'Memory stack', width: 0.011, height: 0.01 },
  bridge: { name: 'Bridge die', width: 0.004, height: 0.008 },
  passive: { name: 'Passive', width: 0.002, height: 0.001 },
};

/** One built-in template per part kind. */
export const defaultTemplates = Object.fromEntries(
  (Object.keys(sizes) as PartKind[]).map((kind) => [kind, { ...sizes[kind], kind, rotation: 0, ...structuredClone(FLOORPLAN_DEFAULTS[kind]) }]),
) as Record<PartKind, PartTemplate['part']>;

/** Display names of the part kinds. */
export const kindLabel: Record<PartKind, string> = {
  compute: 'Compute chiplet',
  io: 'I/O die',
  memory: 'Memory stack',
  bridge: 'Bridge',
  passive: 'Passive',
};
