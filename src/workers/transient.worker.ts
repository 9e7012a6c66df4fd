/**
 * Web Worker for the heavier transient and electro-thermal work (impedance, profile simulation, timing
 * answers, coupled solve). Reports progress while it computes; the composables cancel by terminating it.
 */
import { ImpedanceCache } from '@shared/engine/cache';
import { EngineInputError } from '@shared/engine/errors';
import { couplingJob, impedanceJob, simulateJob, timingJob, type NetworkMemo } from '@/components/timeline/transientJobs';
import type { TransientReply, TransientRequest } from '@/components/timeline/protocol';

interface WorkerScope {
  onmessage: ((event: MessageEvent<TransientRequest>) => void) | null;
  postMessage(message: TransientReply): void;
}

const scope = self as unknown as WorkerScope;
const cache = new ImpedanceCache();
const memo: NetworkMemo = { key: '', net: null };

scope.onmessage = (event) => {
  const req = event.data;
  const { job } = req;
  const t0 = performance.now();
  let lastReport = -1;
  const onProgress = (fraction: number) => {
    if (fraction - lastReport < 0.01 && fraction < 1) return;
    lastReport = fraction;
    scope.postMessage({ job, kind: 'progress', fraction });
  };
  const ms = () => performance.now() - t0;
  try {
    if (req.kind === 'impedance') scope.postMessage({ job, kind: 'impedance', result: impedanceJob(req.model, req.count, { onProgress }), ms: ms() });
    else if (req.kind === 'simulate') scope.postMessage({ job, kind: 'simulate', result: simulateJob(req.params, { onProgress }), ms: ms() });
    else if (req.kind === 'timing') scope.postMessage({ job, kind: 'timing', result: timingJob(req.params), ms: ms() });
    else scope.postMessage({ job, kind: 'coupling', result: couplingJob(req.model, req.scenarioId, memo, cache), ms: ms() });
  } catch (e) {
    const path = e instanceof EngineInputError ? e.path : undefined;
    scope.postMessage({ job, kind: 'error', message: (e as Error).message || String(e), path, ms: ms() });
  }
};
