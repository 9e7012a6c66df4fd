/** Placements of the LX-9 demo variants: part centres in mm from the interposer's lower-left corner. */
import type { PartKind } from '../schemas/model';

/** Where one part goes (mm) and what it is. */
export interface Placement {
  id: string;
  name: string;
  kind: PartKind;
  x: number;
  y: number;
  rotation: 0 | 90 | 180 | 270;
}

const p = (id: string, name: string, kind: PartKind, x: number, y: number, rotation: Placement['rotation'] = 0): Placement => ({ id, name, kind, x, y, rotation });

/** Memory stacks are 11 × 10 mm, placed turned by 90° (10 mm wide, 11 mm tall). */
const mem = (n: number, x: number, y: number): Placement => p(`mem-${n}`, `Memory stack ${n}`, 'memory', x, y, 90);

/** The three variants (interposer 46 × 34 mm; every gap ≥ 0.3 mm, also to the interposer edge). */
export const LX9_PLACEMENTS: Record<'A' | 'B' | 'C', { name: string; parts: Placement[] }> = {
  A: {
    name: 'A — memory flanking compute',
    parts: [
      p('cpu-w', 'Compute chiplet South', 'compute', 27.5, 9.0),
      p('cpu-e', 'Compute chiplet North', 'compute', 27.5, 25.0),
      p('io', 'I/O die', 'io', 4.8, 22.0),
      p('bridge', 'Bridge die', 'bridge', 4.8, 11.0),
      mem(1, 15.0, 10.5),
      mem(2, 15.0, 23.5),
      mem(3, 40.0, 10.5),
      mem(4, 40.0, 23.5),
    ],
  },
  B: {
    name: 'B — memory on one side',
    parts: [
      p('cpu-w', 'Compute chiplet South', 'compute', 16.5, 9.0),
      p('cpu-e', 'Compute chiplet North', 'compute', 16.5, 25.0),
      p('io', 'I/O die', 'io', 4.8, 22.0),
      p('bridge', 'Bridge die', 'bridge', 4.8, 11.0),
      mem(1, 29.5, 10.5),
      mem(2, 29.5, 23.5),
      mem(3, 40.5, 10.5),
      mem(4, 40.5, 23.5),
    ],
  },
  C: {
    name: 'C — wider gaps',
    parts: [
      p('cpu-w', 'Compute chiplet South', 'compute', 27.4, 7.9),
      p('cpu-e', 'Compute chiplet North', 'compute', 27.4, 26.1),
      p('io', 'I/O die', 'io', 4.3, 22.0),
      p('bridge', 'Bridge die', 'bridge', 4.3, 11.0),
      mem(1, 14.1, 9.0),
      mem(2, 14.1, 25.0),
      mem(3, 40.7, 9.0),
      mem(4, 40.7, 25.0),
    ],
  },
};
