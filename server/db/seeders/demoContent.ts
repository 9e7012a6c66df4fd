/** What the demo seed puts into the demo workspace: project, assembly, the three LX-9 variants and the materials (from shared/demo). */
import type { Model } from '@shared/schemas/model';
import type { MaterialCreate } from '@shared/schemas/library';
import { lx9Variants } from '@shared/demo/lx9';
import { DEMO_MATERIALS } from '@shared/demo/materials';

/** Name + note of a seeded record. */
export interface Named {
  name: string;
  description: string;
}

/** Everything the demo seed writes besides the users. */
export interface DemoContent {
  project: Named;
  assembly: Named;
  variants: { name: string; note: string; model: Model }[];
  materials: MaterialCreate[];
}

const notes: Record<'A' | 'B' | 'C', string> = {
  A: 'Starting placement: memory stacks flank each compute chiplet.',
  B: 'All memory stacks on one side of the compute pair.',
  C: 'Same order as A with wider gaps between compute and memory.',
};

/** The demo content (invented data: see shared/demo). */
export function demoContent(): DemoContent {
  return {
    project: {
      name: 'LX-9 accelerator module',
      description: 'Invented demo: two compute chiplets, an I/O die, four memory stacks and a bridge on a silicon interposer.',
    },
    assembly: { name: 'LX-9 package', description: '46 × 34 mm silicon interposer under a 2 mm copper lid with a cold plate.' },
    variants: lx9Variants().map((v) => ({ name: v.name, note: notes[v.id], model: v.model })),
    materials: DEMO_MATERIALS.map((m) => ({
      name: m.name, kxy: m.kxy, kz: m.kz, rho: m.rho, cp: m.cp, source: m.source,
      kind: m.source.startsWith('common practice') ? 'common-practice' : 'handbook',
    })),
  };
}
