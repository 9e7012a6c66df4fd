/** Plain-language numbers for the timing answers: durations with a unit, temperatures, powers. */

/** A duration in s as "850 µs", "38 ms", "1.25 s", "3.5 min" or "2.1 h" (3 significant digits). */
export function formatDuration(seconds: number): string {
  const sig = (v: number) => Number(v.toPrecision(3)).toString();
  if (seconds === 0) return '0 s';
  if (seconds < 1e-3) return `${sig(seconds * 1e6)} µs`;
  if (seconds < 1) return `${sig(seconds * 1e3)} ms`;
  if (seconds < 120) return `${sig(seconds)} s`;
  if (seconds < 7200) return `${sig(seconds / 60)} min`;
  return `${sig(seconds / 3600)} h`;
}

/** A temperature as "105 °C" (one decimal when not whole). */
export function formatCelsius(t: number): string {
  return `${Number(t.toFixed(1)).toString()} °C`;
}

/** A power as "160 W" (3 significant digits). */
export function formatWatts(p: number): string {
  return `${Number(p.toPrecision(3)).toString()} W`;
}

/** A fraction as a percentage "42 %" (one decimal below 10 %). */
export function formatPercent(f: number): string {
  const v = f * 100;
  return `${Number(v.toFixed(v < 10 ? 1 : 0)).toString()} %`;
}
