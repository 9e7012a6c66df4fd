/** Time-axis units and labels of the Timeline screen (s inside, µs / ms / s / min on screen). */

/** The display unit for a time span: its name and seconds per unit. */
export function timeUnit(span: number): { unit: string; scale: number } {
  if (span < 2e-3) return { unit: 'µs', scale: 1e-6 };
  if (span < 2) return { unit: 'ms', scale: 1e-3 };
  if (span < 300) return { unit: 's', scale: 1 };
  return { unit: 'min', scale: 60 };
}

/** A tick label for time t (s) in a given unit, without trailing zeros. */
export function tickLabel(t: number, scale: number): string {
  return Number((t / scale).toPrecision(4)).toString();
}

/** A log-axis tick label: 1 µs, 10 µs, 100 µs, 1 ms, … , 1 s, 10 s, 100 s, 1000 s. */
export function logTickLabel(t: number): string {
  if (t < 1e-3) return `${Number((t * 1e6).toPrecision(3))} µs`;
  if (t < 1) return `${Number((t * 1e3).toPrecision(3))} ms`;
  return `${Number(t.toPrecision(3))} s`;
}
