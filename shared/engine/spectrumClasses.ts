/** Grouping of sources whose spectra along one axis are identical (same centre line and size). */

/** Group identical spectrum rows (sources sharing centre and size along one axis). */
export function axisClasses(f: Float64Array, count: number, modes: number): { classOf: Int32Array; reps: number[] } {
  const classOf = new Int32Array(count);
  const reps: number[] = [];
  const byKey = new Map<string, number[]>();
  for (let i = 0; i < count; i++) {
    const base = i * modes;
    const key = `${f[base + Math.min(1, modes - 1)]}|${f[base + Math.min(2, modes - 1)]}|${f[base + Math.min(5, modes - 1)]}`;
    const bucket = byKey.get(key) ?? [];
    let found = -1;
    for (const c of bucket) {
      const rb = reps[c] * modes;
      let same = true;
      for (let m = 0; m < modes && same; m++) same = f[rb + m] === f[base + m];
      if (same) {
        found = c;
        break;
      }
    }
    if (found < 0) {
      found = reps.length;
      reps.push(i);
      bucket.push(found);
      byKey.set(key, bucket);
    }
    classOf[i] = found;
  }
  return { classOf, reps };
}
