/** What the demo seed puts into the demo workspace: project, assembly, variants and materials. */
import type { Model } from '@shared/schemas/model';
import type { MaterialCreate } from '@shared/schemas/library';
import { fallbackModel } from './fallbackModel';

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

/** Handbook values (Incropera et al., Fundamentals of Heat and Mass Transfer, 7th ed., Table A.1, near 300 K). */
const handbookMaterials: MaterialCreate[] = [
  { name: 'Silicon', kxy: 148, kz: 148, rho: 2330, cp: 712, source: 'Incropera 7th ed., Table A.1 (300 K)', kind: 'handbook' },
  { name: 'Copper (pure)', kxy: 401, kz: 401, rho: 8933, cp: 385, source: 'Incropera 7th ed., Table A.1 (300 K)', kind: 'handbook' },
];

/** The demo content; the three LX-9 variants come from shared/demo once that module exists. */
export function demoContent(): DemoContent {
  const model = fallbackModel();
  return {
    project: { name: 'LX-9 accelerator module', description: 'Invented demo: two compute chiplets, an I/O die and four memory stacks on a silicon interposer.' },
    assembly: { name: 'LX-9 package', description: '46 × 34 mm interposer under a copper lid with a cold plate.' },
    variants: [
      { name: 'A — memory flanking compute', note: 'Starting placement.', model },
      { name: 'B — memory on one side', note: 'Memory stacks moved to one edge.', model },
      { name: 'C — wider gaps', note: 'More space between compute and memory.', model },
    ],
    materials: handbookMaterials,
  };
}
