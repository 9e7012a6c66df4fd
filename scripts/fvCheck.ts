/**
 * `npx tsx scripts/fvCheck.ts [--quick] [--fine]`: the compact assembly model (solveAssembly) against our own
 * numerical reference (FV) of the whole assembly (tests/shared/engine/fvAssembly.ts) on the check assembly
 * (compute die, 4-tier memory stack, I/O die). Prints, per grid, the FV node temperatures, junction
 * influence matrix and heat split; then a Richardson estimate of the FV's converged values (observed order
 * from three grids) and the compact model's error against it; then diagnostic variants that switch one
 * idealisation off at a time. Grids: base cells ≤ 1 mm laterally, ≤ 0.4 mm through thickness, refined
 * ×1, ×2, ×4 (--quick: ×1, ×2 only, order 2 assumed; --fine: also ×8 for the scenario, ~3.3 M cells, minutes).
 */
import { solveAssembly } from '../shared/engine/assembly';
import { modelSchema, type Model } from '../shared/schemas/model';
import { fvCheckModel, fvFigures, type FvFigures, type FvModelOptions, type FvNode } from '../tests/shared/engine/fvAssembly';

const quick = process.argv.includes('--quick');
const fine = process.argv.includes('--fine');
const BASE = { maxDx: 1e-3, maxDz: 0.4e-3 };
const f2 = (v: number): string => v.toFixed(2);
const f3 = (v: number): string => v.toFixed(3);
const f4 = (v: number): string => v.toFixed(4);
const pct = (v: number): string => `${v >= 0 ? '+' : ''}${(100 * v).toFixed(1)} %`;

const model = fvCheckModel();
const compact = solveAssembly(model, undefined, { cache: null });
const tTop = model.stack.cooling.top.fluidTemperature;
const compactNodes = compact.parts.flatMap((p) => [p.junction, ...p.tiers.map((t) => t.temperature)]);
const Rc = compact.influence.matrix;

interface Run extends FvFigures {
  nodes: FvNode[];
  refine: number;
  seconds: number;
}
function run(refine: number, m: Model, options: FvModelOptions & { withInfluence?: boolean }): Run {
  const t0 = performance.now();
  const f = fvFigures(m, { ...BASE, refine }, options);
  return { ...f, refine, seconds: (performance.now() - t0) / 1000 };
}

const refines = quick ? [1, 2] : [1, 2, 4];
const runs: Run[] = [];
let labels: string[] = [];
for (const r of refines) {
  const f = run(r, model, { withInfluence: true });
  labels = f.nodes.map((nd) => `${model.parts[nd.part].id}${nd.tier ? `.t${nd.tier}` : ''}`);
  runs.push(f);
  console.log(`FV ×${r}: ${f.grid.nx}×${f.grid.ny}×${f.grid.nz} = ${f.cells} cells, ${f.iterations} CG iterations (scenario), ${f.seconds.toFixed(1)} s (4 solves)`);
  console.log(`  nodes (°C): ${labels.map((l, i) => `${l} ${f3(f.nodeT[i])}`).join('  ')}`);
  console.log(`  heat: top ${f4(f.toTop)} W, bottom ${f4(f.toBottom)} W, energy balance ${((f.toTop + f.toBottom - f.power) / f.power).toExponential(1)}`);
  console.log(`  R (K/W): ${f.R!.map((row) => row.map(f4).join(' ')).join(' | ')}`);
}
if (fine) {
  const f = run(8, model, {});
  runs.push(f);
  console.log(`FV ×8: ${f.grid.nx}×${f.grid.ny}×${f.grid.nz} = ${f.cells} cells, ${f.iterations} CG iterations, ${f.seconds.toFixed(1)} s`);
  console.log(`  nodes (°C): ${labels.map((l, i) => `${l} ${f3(f.nodeT[i])}`).join('  ')}`);
}

/** Richardson: from the last three values (observed order, clamped to 1 … 3) or the last two (order 2). */
function extrapolate(values: number[]): { value: number; order: number; error: number } {
  const n = values.length;
  const [a, b, c] = n >= 3 ? values.slice(n - 3) : [NaN, values[n - 2], values[n - 1]];
  let order = 2;
  if (n >= 3 && (a - b) / (b - c) > 1) order = Math.min(3, Math.max(1, Math.log2((a - b) / (b - c))));
  const error = (c - b) / (2 ** order - 1);
  return { value: c + error, order, error: Math.abs(error) };
}

console.log(`\nCompact (solveAssembly) vs FV extrapolated; % of the FV rise above the top fluid (${tTop} °C):`);
labels.forEach((l, i) => {
  const e = extrapolate(runs.map((r) => r.nodeT[i]));
  const d = compactNodes[i] - e.value;
  console.log(`  ${l.padEnd(7)} compact ${f3(compactNodes[i])}  FV ${f3(e.value)} (±${f3(e.error)}, order ${e.order.toFixed(1)})  diff ${d >= 0 ? '+' : ''}${f2(d)} K ${pct(d / (e.value - tTop))}`);
});
const withR = runs.filter((r) => r.R);
console.log('  R_ij: compact / FV extrapolated / relative error');
Rc.forEach((row, i) =>
  console.log(
    `   ${row
      .map((v, j) => {
        const e = extrapolate(withR.map((r) => r.R![i][j]));
        return `${f4(v)} / ${f4(e.value)} / ${pct((v - e.value) / e.value)}`;
      })
      .join('   ')}`,
  ),
);
Rc.forEach((row, i) => {
  const fvRow = model.parts.map((_, j) => extrapolate(withR.map((r) => r.R![i][j])).value).reduce((a, b) => a + b, 0);
  const cRow = row.reduce((a, b) => a + b, 0);
  console.log(`  row sum ${model.parts[i].id}: compact ${f4(cRow)}  FV ${f4(fvRow)}  ${pct((cRow - fvRow) / fvRow)}`);
});
const down = extrapolate(withR.map((r) => r.toBottom));
console.log(`  heat to the board side: compact ${f3(compact.energyBalance.toBottom)} W, FV ${f3(down.value)} W`);

// Diagnostics on the ×2 grid: one idealisation removed at a time (the compact model solved on the same model).
console.log('\nDiagnostics (FV ×2; compact − FV, junction K and R_ij %):');
const base = fvCheckModel();
const noRim = modelSchema.parse({ ...base, stack: { ...base.stack, substrate: { ...base.stack.substrate, width: base.stack.interposer.width, height: base.stack.interposer.height } } });
const cases: [string, Model, FvModelOptions][] = [
  ['as built', base, {}],
  ['FV parts 1-D (no in-die spreading)', base, { lateralInParts: false }],
  ['substrate = interposer footprint (no rim)', noRim, {}],
  ['FV gaps filled with mold k 0.8', base, { fill: { kxy: 0.8, kz: 0.8 } }],
];
for (const [name, m, opt] of cases) {
  const c = solveAssembly(m, undefined, { cache: null });
  const f = name === 'as built' ? runs[1] : run(2, m, { ...opt, withInfluence: true });
  const jn = m.parts.map((_, p) => f.nodes.findIndex((nd) => nd.part === p && nd.tier === 0));
  console.log(`  ${name}`);
  console.log(`    junctions: ${c.parts.map((p, k) => `${p.id} ${(p.junction - f.nodeT[jn[k]] >= 0 ? '+' : '') + f2(p.junction - f.nodeT[jn[k]])}`).join('  ')}`);
  console.log(`    R: ${c.influence.matrix.map((row, i) => row.map((v, j) => pct((v - f.R![i][j]) / f.R![i][j])).join(' ')).join(' | ')}`);
  console.log(`    board side: compact ${f3(c.energyBalance.toBottom)} W, FV ${f3(f.toBottom)} W`);
}
