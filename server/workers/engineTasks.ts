/** Runs one engine task inside a worker thread; engine failures come back as data, never as a thrown clone. */
import { solveAssembly, solveChannelBody } from '@shared/engine';
import { EngineInputError } from '@shared/engine/errors';
import { assemblyImpedance, modelTimingAnswers, prepareModelTransient, scenarioTimeline } from '@shared/engine/transient';
import { writeNetlist } from '@shared/export';
import { netlistModel } from '../api/io/netlistModel';
import type { AssemblyTexts, EngineTask, ProgressMessage, TaskOutcome } from './taskTypes';

/** Minimum change of the fraction between two progress messages (keeps the port quiet). */
const PROGRESS_STEP = 0.02;

function compute(task: EngineTask): unknown {
  if (task.kind === 'assembly') {
    const { maps, ...summary } = solveAssembly(task.model, task.scenarioId);
    return { summary: JSON.stringify(summary), maps: task.maps ? JSON.stringify(maps) : null } satisfies AssemblyTexts;
  }
  if (task.kind === 'channel') return solveChannelBody(task.body);
  if (task.kind === 'netlist') {
    const result = solveAssembly(task.model, task.scenarioId);
    return writeNetlist(netlistModel(task.model, result, task.netlist), { source: task.source });
  }
  if (task.kind === 'timeline') return scenarioTimeline(prepareModelTransient(task.model), task.model, task.scenarioId, { feedback: task.feedback });
  if (task.kind === 'timing') return modelTimingAnswers(prepareModelTransient(task.model), task.model, task.request);
  let last = -1;
  const onProgress = (fraction: number) => {
    if (fraction - last < PROGRESS_STEP && fraction < 1) return;
    last = fraction;
    task.port?.postMessage({ fraction } satisfies ProgressMessage);
  };
  return assemblyImpedance(task.model, { count: task.count, onProgress });
}

/** Piscina handler: compute the task and describe the outcome. */
export default function runTask(task: EngineTask): TaskOutcome {
  const t0 = performance.now();
  const ms = () => performance.now() - t0;
  try {
    const result = compute(task);
    return { ok: true, result, ms: ms() };
  } catch (err) {
    if (err instanceof EngineInputError) return { ok: false, error: { kind: 'input', path: err.path, message: err.message, issues: err.issues }, ms: ms() };
    return { ok: false, error: { kind: 'failed', message: err instanceof Error ? err.message : String(err) }, ms: ms() };
  } finally {
    if (task.kind === 'impedance') task.port?.close();
  }
}
