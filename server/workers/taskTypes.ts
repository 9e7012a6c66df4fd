/** Messages between the server and its engine worker threads (structured-clone safe). */
import type { Model } from '@shared/schemas/model';
import type { InputIssue } from '@shared/engine/errors';
import type { PartTimingRequest } from '@shared/engine/transient';
import type { MessagePort } from 'node:worker_threads';
import type { ExportSource } from '@shared/export/units';
import type { NetlistKind } from '../api/io/netlistModel';

/** One unit of engine work for a worker thread. */
export type EngineTask =
  | { kind: 'assembly'; model: Model; scenarioId: string; maps: boolean }
  | { kind: 'channel'; body: unknown }
  | { kind: 'netlist'; model: Model; scenarioId?: string; netlist: NetlistKind; source: ExportSource }
  | { kind: 'impedance'; model: Model; count: number; port?: MessagePort }
  | { kind: 'timeline'; model: Model; scenarioId: string; feedback: boolean }
  | { kind: 'timing'; model: Model; request: PartTimingRequest };

/**
 * What an 'assembly' task answers: the result as JSON text without its plane maps, and the maps as
 * JSON text when asked for (null otherwise) — written on the worker thread, never on the HTTP thread.
 */
export interface AssemblyTexts {
  summary: string;
  maps: string | null;
}

/** Progress message a long task posts on its port: fraction done, 0–1. */
export interface ProgressMessage {
  fraction: number;
}

/** What a worker answers: the result, or the failure described in words (errors lose their class across threads). */
export type TaskOutcome =
  | { ok: true; result: unknown; ms: number }
  | { ok: false; error: { kind: 'input'; path: string; message: string; issues: InputIssue[] } | { kind: 'failed'; message: string }; ms: number };
