/** Table rows of the report, pure: stack-up layers, loads per scenario, results per scenario (display units). */
import type { Layer, Model } from '@shared/schemas/model';
import type { AssemblyResult } from '@shared/engine/assembly/result';

/** One stack-up layer as printed: where it sits, thickness in µm, conductivities in W/m·K. */
export interface LayerRow {
  region: string;
  name: string;
  thickness: string;
  kxy: string;
  kz: string;
}

const layer = (region: string, l: Layer): LayerRow => ({
  region, name: [l.name, l.material].filter(Boolean).join(' — ') || '—', thickness: (l.thickness * 1e6).toFixed(0), kxy: l.kxy.toPrecision(3), kz: l.kz.toPrecision(3),
});

/** The shared stack-up from the lid down to the substrate. */
export function stackRows(model: Model): LayerRow[] {
  const s = model.stack;
  return [
    ...s.lid.layers.map((l) => layer('Lid', l)),
    ...s.interposer.layers.map((l) => layer('Interposer', l)),
    layer('C4 + underfill', s.c4),
    ...s.substrate.layers.map((l) => layer('Substrate', l)),
  ];
}

/** Total power (W) of every part in every scenario: rows = parts, columns = scenarios. */
export function loadRows(model: Model): { part: string; powers: number[] }[] {
  return model.parts.map((p) => ({
    part: p.name,
    powers: model.scenarios.map((s) => {
      const l = s.loads[p.id];
      return l ? l.power + (l.tiers ?? []).reduce((a, b) => a + b, 0) : 0;
    }),
  }));
}

/** Per part of one result: power, mean junction, hot spot, hottest tier, limit and margin (°C, K, W). */
export function resultRows(r: AssemblyResult) {
  return r.parts.map((p) => ({
    id: p.id,
    name: p.name,
    power: p.power,
    junction: p.junction,
    peak: p.peak,
    tier: p.tiers.length ? Math.max(...p.tiers.map((t) => t.temperature)) : null,
    limit: p.limit,
    margin: p.margin,
  }));
}
