/** Solve several scenarios of a model one after another in one engine worker (the report needs all of them). */
import { toRaw } from 'vue';
import type { Model } from '@shared/schemas/model';
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { createSolveWorker } from '@/composables/useLiveSolve';
import type { SolveReply } from '@/workers/protocol';

/** Map side of report solves (maps are not printed). */
const REPORT_MAP_SIZE = 32;

/** Results in the order of `scenarioIds`; rejects with the engine's message on the first failure. */
export function solveScenarios(model: Model, scenarioIds: string[]): Promise<AssemblyResult[]> {
  const worker = createSolveWorker();
  const plain = structuredClone(toRaw(model));
  const results: AssemblyResult[] = [];
  return new Promise<AssemblyResult[]>((resolve, reject) => {
    const next = () => {
      if (results.length === scenarioIds.length) return resolve(results);
      worker.postMessage({ job: results.length, model: plain, scenarioId: scenarioIds[results.length], mapSize: REPORT_MAP_SIZE });
    };
    worker.onmessage = (event: MessageEvent<SolveReply>) => {
      const reply = event.data;
      if (!reply.ok) return reject(new Error(`Scenario "${scenarioIds[results.length]}": ${reply.message}`));
      results.push(reply.result);
      next();
    };
    worker.onerror = (e) => reject(new Error(e.message || 'The engine worker failed.'));
    next();
  }).finally(() => worker.terminate());
}
