/** Web Worker: runs the thermal engine off the main thread; keeps its own modal-table cache between drags. */
import { EngineInputError, ImpedanceCache, solveAssembly } from '@shared/engine';
import type { SolveReply, SolveRequest } from './protocol';

interface WorkerScope {
  onmessage: ((event: MessageEvent<SolveRequest>) => void) | null;
  postMessage(message: SolveReply): void;
}

const scope = self as unknown as WorkerScope;
const cache = new ImpedanceCache();

scope.onmessage = (event) => {
  const { job, model, scenarioId, mapSize } = event.data;
  const t0 = performance.now();
  try {
    const result = solveAssembly(model, scenarioId, { cache, mapSize });
    scope.postMessage({ job, ok: true, result, ms: performance.now() - t0 });
  } catch (e) {
    const path = e instanceof EngineInputError ? e.path : undefined;
    scope.postMessage({ job, ok: false, message: (e as Error).message || String(e), path, ms: performance.now() - t0 });
  }
};
