/** Number formats of the result views: °C for temperatures, K for rises and margins, K/W, W, %. */

const fixed = (v: number, d: number) => (Number.isFinite(v) ? v.toFixed(d) : '—');

/** A temperature, e.g. "112.8 °C". */
export const degC = (v: number) => `${fixed(v, 1)} °C`;
/** A rise or difference, e.g. "12.4 K" (signed when `signed`). */
export const kelvin = (v: number, signed = false) => `${signed && v > 0 ? '+' : ''}${fixed(v, 1)} K`;
/** A thermal resistance, e.g. "0.340 K/W". */
export const kPerW = (v: number) => `${fixed(v, 3)} K/W`;
/** A power, e.g. "160.0 W" (2 decimals below 10 W). */
export const watts = (v: number) => `${fixed(v, Math.abs(v) < 10 ? 2 : 1)} W`;
/** A fraction 0 … 1 as a percentage, e.g. "25 %". */
export const percent = (f: number, digits = 0) => `${fixed(f * 100, digits)} %`;

/** The temperature a part's limit is checked on (logic: hot spot; memory: hottest of base die and DRAM tier means). */
export function checkedTemperature(p: { limit: number; margin: number }): number {
  return p.limit - p.margin;
}
