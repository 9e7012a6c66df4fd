/** Runs jobs on a transient worker as promises, with progress callbacks; cancelling terminates the worker. */
import type { TransientReply, TransientRequest, TransientWorkerLike } from './protocol';

type Request = TransientRequest extends infer R ? (R extends TransientRequest ? Omit<R, 'job'> : never) : never;
type Kind = Exclude<TransientReply['kind'], 'progress' | 'error'>;
/** The reply of a request kind. */
export type ReplyOf<K extends Kind> = Extract<TransientReply, { kind: K }>;

/** A job that ended in an engine error; `path` names the field at fault when known. */
export class JobError extends Error {
  constructor(message: string, readonly path?: string) {
    super(message);
    this.name = 'JobError';
  }
}

/** Raised for every pending job when the runner is cancelled. */
export class JobCancelledError extends Error {
  constructor() {
    super('Cancelled.');
    this.name = 'JobCancelledError';
  }
}

interface Pending {
  resolve: (reply: TransientReply) => void;
  reject: (error: Error) => void;
  onProgress?: (fraction: number) => void;
}

/** The Vite-bundled transient worker. */
export function createTransientWorker(): TransientWorkerLike {
  return new Worker(new URL('../../workers/transient.worker.ts', import.meta.url), { type: 'module' }) as unknown as TransientWorkerLike;
}

/** A job runner over one lazily created worker. */
export function createJobRunner(create: () => TransientWorkerLike = createTransientWorker) {
  let worker: TransientWorkerLike | null = null;
  let next = 1;
  const pending = new Map<number, Pending>();

  function failAll(error: Error): void {
    for (const p of pending.values()) p.reject(error);
    pending.clear();
  }

  function ensure(): TransientWorkerLike {
    if (worker) return worker;
    worker = create();
    worker.onmessage = (event) => {
      const reply = event.data;
      const p = pending.get(reply.job);
      if (!p) return;
      if (reply.kind === 'progress') return p.onProgress?.(reply.fraction);
      pending.delete(reply.job);
      if (reply.kind === 'error') p.reject(new JobError(reply.message, reply.path));
      else p.resolve(reply);
    };
    worker.onerror = (e) => {
      e.preventDefault?.();
      worker?.terminate();
      worker = null;
      failAll(new JobError(`The transient worker stopped: ${e.message || 'worker error'}`));
    };
    return worker;
  }

  /** Post a job; resolves with its reply, rejects with JobError or JobCancelledError. */
  function run<K extends Kind>(request: Request & { kind: K }, onProgress?: (fraction: number) => void): Promise<ReplyOf<K>> {
    const job = next++;
    return new Promise<ReplyOf<K>>((resolve, reject) => {
      pending.set(job, { resolve: resolve as (r: TransientReply) => void, reject, onProgress });
      ensure().postMessage({ ...request, job } as TransientRequest);
    });
  }

  /** Stop whatever runs now: the worker is terminated and every pending job rejects. */
  function cancel(): void {
    worker?.terminate();
    worker = null;
    failAll(new JobCancelledError());
  }

  return { run, cancel, dispose: cancel, busy: () => pending.size > 0 };
}

/** A job runner as returned by createJobRunner. */
export type JobRunner = ReturnType<typeof createJobRunner>;
