/** Layout warnings the engine notices while solving (it still solves overlapping parts, by superposition). */
import type { PartGeometry } from './geometry';
import type { AssemblyNetwork } from './network';

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

/** Sentences for planes whose truncation stopped at the cap, and for parts too small to steer it. */
export function truncationWarnings(net: AssemblyNetwork): string[] {
  const rough = new Set<number>();
  for (const plane of [net.lid, net.interposer]) plane?.modes.truncation.roughSources?.forEach((k) => rough.add(plane.parts[k]));
  const small = [...rough].sort((a, b) => a - b).map((p) => `"${net.geometry[p].part.name}"`);
  const notes = small.length
    ? [`${small.join(', ')} ${small.length > 1 ? 'are' : 'is'} much smaller than the other parts: the mode sums are sized for the larger parts, so ${small.length > 1 ? 'their' : 'its'} own figures are rough.`]
    : [];
  return [...notes, ...capWarnings(net)];
}

function capWarnings(net: AssemblyNetwork): string[] {
  const planes = [
    ['lid', net.lid],
    ['interposer', net.interposer],
  ] as const;
  return planes
    .filter(([, plane]) => plane && !plane.modes.truncation.converged)
    .map(([name, plane]) => {
      const t = plane!.modes.truncation;
      return `The ${name} plane's mode sums stopped at the cap (${t.m} × ${t.n} modes) with a last change of ${(t.lastChange * 100).toPrecision(2)} %; very small parts make the sums converge slowly.`;
    });
}
