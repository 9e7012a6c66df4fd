/** Synthetic assemblies of N parts for the bench: a grid of compute dies and memory stacks (SI units). */
import { lx9Model, lx9Stack, demoLayer } from '../../shared/demo/lx9';
import { modelSchema, type Model, type Part } from '../../shared/schemas/model';

const MM = 1e-3;

/** A deterministic shift in (−0.4, 0.4) mm, different for every part and axis. */
function shift(k: number, axis: number): number {
  const v = Math.sin(12.9898 * (k + 1) + 78.233 * axis) * 43758.5453;
  return 0.8 * (v - Math.floor(v) - 0.5);
}

/**
 * The LX-9 demo for 8 parts; otherwise a cols × rows grid of 6 × 5 mm parts, every third a memory stack.
 * `jitter` shifts every part by up to ±0.4 mm (deterministically) so that no two share a row or column.
 */
export function benchModel(parts: number, jitter = false): Model {
  if (parts === 8 && !jitter) return lx9Model('A');
  const cols = Math.ceil(Math.sqrt(parts * 1.2));
  const rows = Math.ceil(parts / cols);
  const w = 6;
  const h = 5;
  const gap = 1;
  const iw = cols * (w + gap) + gap;
  const ih = rows * (h + gap) + gap;
  const base = lx9Stack();
  const stack = {
    ...base,
    interposer: { ...base.interposer, width: iw * MM, height: ih * MM },
    substrate: { ...base.substrate, width: (iw + 14) * MM, height: (ih + 18) * MM },
    lid: { ...base.lid, width: (iw + 6) * MM, height: (ih + 6) * MM },
  };
  const list: Part[] = [];
  const loads: Record<string, { power: number; tiers?: number[] }> = {};
  for (let k = 0; k < parts; k++) {
    const memory = k % 3 === 2;
    const id = `p${k}`;
    list.push({
      id,
      name: id,
      kind: memory ? 'memory' : 'compute',
      x: (gap + (k % cols) * (w + gap) + w / 2 + (jitter ? shift(k, 1) : 0)) * MM,
      y: (gap + Math.floor(k / cols) * (h + gap) + h / 2 + (jitter ? shift(k, 2) : 0)) * MM,
      width: w * MM,
      height: h * MM,
      rotation: 0,
      die: demoLayer('die', 'si', memory ? 100e-6 : 720e-6),
      tim1: demoLayer('TIM1', 'tim-polymer', 50e-6),
      bumps: demoLayer('bumps', 'microbump-underfill', 25e-6),
      memory: memory ? { tiers: 8, tier: demoLayer('tier', 'si', 50e-6), bond: demoLayer('bond', 'dram-bond', 20e-6) } : undefined,
      limits: { junction: memory ? 85 : 105 },
    });
    loads[id] = memory ? { power: 3, tiers: Array(8).fill(0.6) } : { power: 30 };
  }
  return modelSchema.parse({ stack, parts: list, scenarios: [{ id: 'run', name: 'Run', loads }] });
}
