/** Messages between useTransient / useElectroThermal and the transient worker (structured-clone safe). */
import type { Model } from '@shared/schemas/model';
import type { CouplingResult } from '@shared/engine/electrothermal';
import type { FosterNetwork, FosterNetworkFit, ImpedanceChecks, SimulationResult, TimingAnswers, TimingRequest } from '@shared/engine/transient';

/** Impedance of a model and its Foster fit. Z[k][j][i]: rise of node j at times[k] per W stepped in source i (K/W). */
export interface ImpedanceResult {
  times: number[];
  Z: number[][][];
  /** Steady matrix nodes × sources (K/W). */
  steady: number[][];
  /** Node-level steady influence matrix (K/W), for coupled start states. */
  nodeSteady: number[][];
  /** The engine's source labels ("cpu-w", "mem-1/tiers"). */
  sourceKeys: string[];
  /** Time after which every response has settled (s). */
  settleTime: number;
  checks: ImpedanceChecks;
  /** Node temperatures with no power (the fluid offsets), °C. */
  baseTemperatures: number[];
  fit: Omit<FosterNetworkFit, 'network'>;
  network: FosterNetwork;
  /** How Z was obtained, in words (inversion method, terms, times). */
  method: string;
}

/** What to simulate: a scenario's profile on a fitted network. */
export interface SimulateParams {
  network: FosterNetwork;
  baseTemperatures: number[];
  nodeSteady: number[][];
  model: Model;
  scenarioId: string;
  /** Apply leakage / Joule feedback (P(T) at each step). */
  feedback: boolean;
  samplesPerInterval: number;
}

/** What to ask for timing answers. */
export interface TimingParams {
  network: FosterNetwork;
  baseTemperatures: number[];
  request: TimingRequest;
}

/** A job for the transient worker. */
export type TransientRequest =
  | { job: number; kind: 'impedance'; model: Model; count: number }
  | { job: number; kind: 'simulate'; params: SimulateParams }
  | { job: number; kind: 'timing'; params: TimingParams }
  | { job: number; kind: 'coupling'; model: Model; scenarioId: string };

/** The worker's answers; `progress` may come several times before the result. `ms` = time in the engine. */
export type TransientReply =
  | { job: number; kind: 'progress'; fraction: number }
  | { job: number; kind: 'impedance'; result: ImpedanceResult; ms: number }
  | { job: number; kind: 'simulate'; result: SimulationResult; ms: number }
  | { job: number; kind: 'timing'; result: TimingAnswers; ms: number }
  | { job: number; kind: 'coupling'; result: CouplingResult; ms: number }
  | { job: number; kind: 'error'; message: string; path?: string; ms: number };

/** The part of a Worker the composables use (tests pass a fake). */
export interface TransientWorkerLike {
  postMessage(message: TransientRequest): void;
  onmessage: ((event: MessageEvent<TransientReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  terminate(): void;
}
