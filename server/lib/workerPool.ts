/**
 * The engine's worker-thread pool (piscina): heavy solves run off the event loop, behind a
 * bounded queue. A full queue answers 503 `solver_busy`; an aborted task answers 499-style
 * `cancelled` (409); engine input errors keep their 400 meaning, other engine failures 422.
 */
import os from 'node:os';
import { Piscina } from 'piscina';
import { EngineInputError } from '@shared/engine/errors';
import { AppError } from './errors';
import type { EngineTask, TaskOutcome } from '../workers/taskTypes';

/** Pool settings; defaults fit a small machine (threads = cores, at most 4). */
export interface PoolOptions {
  /** Worker threads (default: available cores, 1–4). */
  maxThreads: number;
  /** Tasks allowed to wait for a thread before new ones are refused with 503 (default 256: fifty users each with a few solves waiting). */
  maxQueue: number;
  /** Milliseconds an idle thread lives before it exits (default 60 000). */
  idleTimeoutMs: number;
}

/** Default pool settings. */
export const POOL_DEFAULTS: PoolOptions = {
  maxThreads: Math.max(1, Math.min(4, os.availableParallelism())),
  maxQueue: 256,
  idleTimeoutMs: 60_000,
};

const entry = new URL('../workers/entry.mjs', import.meta.url).href;
let pool: Piscina | null = null;
let options: PoolOptions = POOL_DEFAULTS;

/** Change the pool settings (closes the current pool; the next task opens a new one). */
export async function configurePool(next: Partial<PoolOptions>): Promise<void> {
  await closePool();
  options = { ...POOL_DEFAULTS, ...next };
}

function open(): Piscina {
  pool ??= new Piscina({
    filename: entry,
    minThreads: 0,
    maxThreads: options.maxThreads,
    maxQueue: options.maxQueue,
    idleTimeout: options.idleTimeoutMs,
  });
  return pool;
}

/** Run `task` on a worker thread; resolves with the engine's result or throws a typed AppError / EngineInputError. */
export async function runEngineTask<T>(task: EngineTask, opts: { signal?: AbortSignal } = {}): Promise<T> {
  let outcome: TaskOutcome;
  try {
    const transferList = task.kind === 'impedance' && task.port ? [task.port] : undefined;
    outcome = (await open().run(task, { signal: opts.signal, transferList })) as TaskOutcome;
  } catch (err) {
    throw poolError(err);
  }
  if (outcome.ok) return outcome.result as T;
  const e = outcome.error;
  if (e.kind === 'input') throw new EngineInputError(e.path, e.message, e.issues);
  throw new AppError(422, 'engine_failed', `The solver could not solve this model: ${e.message}. Check the stack-up and the cooling for missing or extreme values.`);
}

function poolError(err: unknown): AppError {
  const e = err as Error;
  if (e?.message === 'Task queue is at limit' || e?.message === 'No task queue available and all Workers are busy') {
    return new AppError(503, 'solver_busy', `The solver is busy (${options.maxQueue} solves already waiting). Try again in a few seconds.`);
  }
  if (e?.name === 'AbortError') return new AppError(409, 'cancelled', 'The computation was cancelled.');
  return new AppError(503, 'solver_unavailable', `The solver could not run this task: ${e?.message ?? String(err)}.`);
}

/** Stop the worker threads (waits for running tasks); the next task opens a new pool. */
export async function closePool(): Promise<void> {
  const p = pool;
  pool = null;
  if (p) await p.close({ force: true });
}
