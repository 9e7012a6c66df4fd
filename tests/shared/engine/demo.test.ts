/** The LX-9 demo stays "at the edge" (product brief): numbers in the expected ranges, layout rules kept. */
import { describe, expect, it } from 'vitest';
import { lx9Variants } from '@shared/demo/lx9';
import { solveAssembly } from '@shared/engine/assembly';
import { partGeometries } from '@shared/engine/assembly/geometry';

describe('LX-9 demo', () => {
  const variants = lx9Variants();

  it('has three variants with non-overlapping parts ≥ 0.2 mm apart, inside the interposer', () => {
    expect(variants.map((v) => v.name)).toEqual(['A — memory flanking compute', 'B — memory on one side', 'C — wider gaps']);
    for (const v of variants) {
      const g = partGeometries(v.model);
      for (const p of g) {
        const f = p.footprint;
        expect(f.x - f.width / 2).toBeGreaterThanOrEqual(0.2e-3);
        expect(f.y - f.height / 2).toBeGreaterThanOrEqual(0.2e-3);
        expect(f.x + f.width / 2).toBeLessThanOrEqual(46e-3 - 0.2e-3);
        expect(f.y + f.height / 2).toBeLessThanOrEqual(34e-3 - 0.2e-3);
      }
      for (let i = 0; i < g.length; i++) {
        for (let j = i + 1; j < g.length; j++) {
          const a = g[i].footprint;
          const b = g[j].footprint;
          const gap = Math.max(Math.abs(a.x - b.x) - (a.width + b.width) / 2, Math.abs(a.y - b.y) - (a.height + b.height) / 2);
          expect(gap, `${g[i].part.id} – ${g[j].part.id} in ${v.id}`).toBeGreaterThanOrEqual(0.2e-3 - 1e-12);
        }
      }
    }
  });

  it('boost puts compute dies just above 100 °C and memory near 80 °C; idle is comfortable (product brief targets)', () => {
    for (const v of variants) {
      const boost = solveAssembly(v.model, 'boost');
      const idle = solveAssembly(v.model, 'idle');
      expect(boost.energyBalance.relativeError).toBeLessThan(1e-9);
      const computes = boost.parts.filter((p) => p.kind === 'compute');
      for (const c of computes) {
        expect(c.junction).toBeGreaterThan(100);
        expect(c.junction).toBeLessThan(112);
        expect(c.peak).toBeGreaterThan(c.junction);
      }
      const tiers = boost.parts.filter((p) => p.kind === 'memory').flatMap((p) => p.tiers.map((t) => t.temperature));
      expect(Math.max(...tiers)).toBeGreaterThan(70);
      expect(Math.max(...tiers)).toBeLessThan(85);
      for (const c of idle.parts) expect(c.junction).toBeLessThan(70);
    }
  });
});
