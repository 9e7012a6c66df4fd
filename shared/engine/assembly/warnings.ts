/** Layout warnings the engine notices while solving (it still solves overlapping parts, by superposition). */
import type { PartGeometry } from './geometry';

/** One sentence per pair of parts that overlap or sit closer than the minimum gap. */
export function overlapWarnings(parts: readonly PartGeometry[], minGap: number): string[] {
  const out: string[] = [];
  for (let i = 0; i < parts.length; i++) {
    for (let j = i + 1; j < parts.length; j++) {
      const a = parts[i].footprint;
      const b = parts[j].footprint;
      const gapX = Math.abs(a.x - b.x) - (a.width + b.width) / 2;
      const gapY = Math.abs(a.y - b.y) - (a.height + b.height) / 2;
      const gap = Math.max(gapX, gapY);
      const names = `"${parts[i].part.name}" and "${parts[j].part.name}"`;
      if (gap < -1e-9) out.push(`${names} overlap; their temperatures are superposed, not physical.`);
      else if (gap < minGap - 1e-9) out.push(`${names} are ${(gap * 1000).toFixed(2)} mm apart, closer than the ${(minGap * 1000).toFixed(2)} mm minimum gap.`);
    }
  }
  return out;
}
