/**
 * Background engine jobs (e.g. the transient impedance of a variant): started, polled for
 * progress, cancelled. Kept in memory only (a restart forgets them; the client asks again);
 * at most MAX_JOBS are remembered and finished ones expire after JOB_TTL_MS.
 */
import { MessageChannel } from 'node:worker_threads';
import { randomUUID } from 'node:crypto';
import { AppError } from '../lib/errors';
import { runEngineTask } from '../lib/workerPool';
import type { EngineTask, ProgressMessage } from './taskTypes';

/** Jobs remembered at once (running or finished); a new job beyond that evicts the oldest finished one, or is refused. */
export const MAX_JOBS = 200;
/** Milliseconds a finished job's answer stays readable. */
export const JOB_TTL_MS = 10 * 60_000;

/** Where a job is. */
export type JobStatus = 'running' | 'done' | 'failed' | 'cancelled';

/** A job as its owner sees it. */
export interface JobView {
  id: string;
  kind: EngineTask['kind'];
  variantId: number;
  status: JobStatus;
  /** Fraction done, 0–1. */
  progress: number;
  result?: unknown;
  error?: { status: number; code: string; message: string };
}

interface Job extends JobView {
  userId: number;
  finishedAt: number | null;
  abort: AbortController;
}

const jobs = new Map<string, Job>();

function prune(now: number): void {
  for (const [id, j] of jobs) if (j.finishedAt !== null && now - j.finishedAt > JOB_TTL_MS) jobs.delete(id);
  if (jobs.size < MAX_JOBS) return;
  const oldest = [...jobs.values()].filter((j) => j.finishedAt !== null).sort((a, b) => a.finishedAt! - b.finishedAt!)[0];
  if (oldest) jobs.delete(oldest.id);
  else throw new AppError(503, 'solver_busy', `Too many analyses are running (${MAX_JOBS}). Try again when some have finished.`);
}

function view(j: Job): JobView {
  const { id, kind, variantId, status, progress, result, error } = j;
  return { id, kind, variantId, status, progress, result, error };
}

/** Start `task` for `userId` on variant `variantId`; returns at once with the job's id. */
export function startJob(userId: number, variantId: number, task: EngineTask): JobView {
  prune(Date.now());
  const channel = new MessageChannel();
  const job: Job = { id: randomUUID(), kind: task.kind, variantId, userId, status: 'running', progress: 0, finishedAt: null, abort: new AbortController() };
  jobs.set(job.id, job);
  channel.port1.on('message', (m: ProgressMessage) => { if (job.status === 'running') job.progress = m.fraction; });
  channel.port1.unref();
  const withPort = task.kind === 'impedance' ? { ...task, port: channel.port2 } : task;
  runEngineTask(withPort, { signal: job.abort.signal })
    .then((result) => { if (job.status === 'running') Object.assign(job, { status: 'done', progress: 1, result }); })
    .catch((err: Error & { status?: number; code?: string }) => {
      if (job.status !== 'running') return;
      const status = err.status ?? (err.name === 'EngineInputError' ? 400 : 500);
      const code = err.name === 'EngineInputError' ? 'engine_input' : (err.code ?? 'engine_failed');
      Object.assign(job, { status: 'failed', error: { status, code, message: err.message } });
    })
    .finally(() => { job.finishedAt ??= Date.now(); channel.port1.close(); });
  return view(job);
}

function own(userId: number, id: string): Job {
  const j = jobs.get(id);
  if (!j || j.userId !== userId) throw new AppError(404, 'not_found', 'Job not found.');
  return j;
}

/** The job `id` of `userId` (404 for anyone else's). */
export function getJob(userId: number, id: string): JobView {
  return view(own(userId, id));
}

/** Cancel the job `id` of `userId`; a finished job is left as it is. */
export function cancelJob(userId: number, id: string): JobView {
  const j = own(userId, id);
  if (j.status === 'running') {
    j.status = 'cancelled';
    j.finishedAt = Date.now();
    j.abort.abort();
  }
  return view(j);
}
