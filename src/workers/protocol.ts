/** Messages between the live-solve composable and the solve worker (structured-clone safe). */
import type { Model } from '@shared/schemas/model';
import type { AssemblyResult } from '@shared/engine';

/** Ask the worker to solve one scenario of a model; `job` comes back with the answer. */
export interface SolveRequest {
  job: number;
  model: Model;
  scenarioId: string;
  /** Plane map side in cells (a power of two). */
  mapSize: number;
}

/** The worker's answer: a result, or an error in words; `ms` is the time spent in the engine. */
export type SolveReply =
  | { job: number; ok: true; result: AssemblyResult; ms: number }
  | { job: number; ok: false; message: string; path?: string; ms: number };

/** The part of a Worker the composable uses (so tests can pass a fake). */
export interface SolveWorkerLike {
  postMessage(message: SolveRequest): void;
  onmessage: ((event: MessageEvent<SolveReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  terminate(): void;
}
