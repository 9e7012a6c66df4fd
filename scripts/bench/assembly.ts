/**
 * Assembly solve (matrix + temperatures + 128×128 plane maps + hot spots) for 4 … 64 parts: "cold" builds
 * every modal table afresh (first solve of a stack-up), "drag" moves one part per run with the tables and
 * truncation cached (what the UI does while a user drags). Grid layouts share rows and columns (cheaper
 * sums); the off-grid 64-part case has none.
 */
import { ImpedanceCache } from '../../shared/engine/cache';
import { solveAssembly } from '../../shared/engine/assembly';
import { benchModel } from './assemblyModels';
import type { BenchCase } from './types';

const SIZES = [4, 8, 16, 32, 64];

function dragCase(parts: number, jitter = false): BenchCase {
  const model = benchModel(parts, jitter);
  const cache = new ImpedanceCache();
  const mover = model.parts[0];
  const x0 = mover.x;
  let step = 0;
  const scenario = model.scenarios.find((s) => s.id === 'boost')?.id ?? model.scenarios[0].id;
  return {
    section: 'assembly solve',
    name: `${parts} parts${jitter ? ' off-grid' : ''}, drag (cached tables)`,
    size: parts,
    run: () => {
      mover.x = x0 + ((step++ % 5) - 2) * 0.05e-3;
      solveAssembly(model, scenario, { cache });
    },
  };
}

function coldCase(parts: number, jitter = false): BenchCase {
  const model = benchModel(parts, jitter);
  const scenario = model.scenarios.find((s) => s.id === 'boost')?.id ?? model.scenarios[0].id;
  return {
    section: 'assembly solve',
    name: `${parts} parts${jitter ? ' off-grid' : ''}, cold (new stack-up)`,
    size: parts,
    repeat: 3,
    warmup: 1,
    run: () => void solveAssembly(model, scenario, { cache: new ImpedanceCache() }),
  };
}

/** Cases of this file. */
export const benchCases: BenchCase[] = [...SIZES.flatMap((n) => [coldCase(n), dragCase(n)]), coldCase(64, true), dragCase(64, true)];
