/**
 * Transient results of the edited variant: the node-level impedance and its Foster fit (computed in
 * the transient worker, with progress and cancel), the selected scenario's profile simulated on it,
 * and timing answers. The impedance depends only on the stack-up and geometry (networkKey), so load
 * and profile edits reuse it.
 */
import { computed, onScopeDispose, ref, shallowRef, toRaw, watch, type Ref } from 'vue';
import type { Model } from '@shared/schemas/model';
import type { SimulationResult, TimingAnswers, TimingRequest } from '@shared/engine/transient';
import { createJobRunner, JobCancelledError, type JobRunner } from '@/components/timeline/jobRunner';
import { networkKey } from '@/components/timeline/nodes';
import type { ImpedanceResult, TransientWorkerLike } from '@/components/timeline/protocol';

/** What the transient state follows. */
export interface TransientSource {
  model: Readonly<Ref<Model | null>>;
  scenarioId: Readonly<Ref<string | null | undefined>>;
}

const message = (e: unknown) => (e instanceof Error ? e.message : String(e));

/** Transient state and actions; one impedance worker and one worker for simulations and answers. */
export function useTransient(source: TransientSource, createWorker?: () => TransientWorkerLike) {
  const heavy: JobRunner = createJobRunner(createWorker);
  const light: JobRunner = createJobRunner(createWorker);
  const impedance = shallowRef<ImpedanceResult | null>(null);
  const impedanceKey = ref('');
  const impedanceMs = ref<number | null>(null);
  const progress = ref<number | null>(null);
  const impedanceError = ref<string | null>(null);
  const simulation = shallowRef<SimulationResult | null>(null);
  const simulationMs = ref<number | null>(null);
  const simulating = ref(false);
  const simulationError = ref<string | null>(null);
  const answers = shallowRef<TimingAnswers | null>(null);
  const answering = ref(false);
  const answerError = ref<string | null>(null);

  const currentKey = computed(() => (source.model.value ? networkKey(source.model.value) : ''));
  const computing = computed(() => progress.value !== null);
  /** The shown impedance belongs to an older stack-up or geometry. */
  const stale = computed(() => !!impedance.value && impedanceKey.value !== currentKey.value);
  const ready = computed(() => !!impedance.value && !stale.value);
  // an impedance error belongs to one stack-up: forget it when that changes, so the screen may try again
  watch(currentKey, () => (impedanceError.value = null));

  /** Compute the impedance of the current model (restarts a running computation). */
  async function computeImpedance(count = 60): Promise<void> {
    const model = source.model.value;
    if (!model) return;
    if (computing.value) heavy.cancel();
    const key = currentKey.value;
    progress.value = 0;
    impedanceError.value = null;
    try {
      const reply = await heavy.run({ kind: 'impedance', model: toRaw(model), count }, (f) => (progress.value = f));
      impedance.value = reply.result;
      impedanceKey.value = key;
      impedanceMs.value = reply.ms;
      progress.value = null;
    } catch (e) {
      if (!(e instanceof JobCancelledError)) impedanceError.value = message(e);
      progress.value = null;
    }
  }

  /** Stop the impedance computation. */
  function cancelImpedance(): void {
    heavy.cancel();
    progress.value = null;
  }

  /** Simulate the selected scenario's profile (optionally with leakage / Joule feedback). */
  async function simulate(feedback: boolean, samplesPerInterval = 8): Promise<void> {
    const model = source.model.value;
    const imp = impedance.value;
    if (!model || !imp || stale.value) return;
    simulating.value = true;
    simulationError.value = null;
    try {
      const params = { network: imp.network, baseTemperatures: imp.baseTemperatures, nodeSteady: imp.nodeSteady, model: toRaw(model), scenarioId: source.scenarioId.value ?? '', feedback, samplesPerInterval };
      const reply = await light.run({ kind: 'simulate', params });
      simulation.value = reply.result;
      simulationMs.value = reply.ms;
    } catch (e) {
      simulation.value = null;
      if (!(e instanceof JobCancelledError)) simulationError.value = message(e);
    } finally {
      simulating.value = false;
    }
  }

  /** Ask the timing answers for one node. */
  async function ask(request: TimingRequest): Promise<void> {
    const imp = impedance.value;
    if (!imp || stale.value) return;
    answering.value = true;
    answerError.value = null;
    try {
      const reply = await light.run({ kind: 'timing', params: { network: imp.network, baseTemperatures: imp.baseTemperatures, request } });
      answers.value = reply.result;
    } catch (e) {
      answers.value = null;
      if (!(e instanceof JobCancelledError)) answerError.value = message(e);
    } finally {
      answering.value = false;
    }
  }

  onScopeDispose(() => {
    heavy.dispose();
    light.dispose();
  });

  return {
    impedance, impedanceMs, impedanceError, progress, computing, stale, ready,
    simulation, simulationMs, simulating, simulationError, answers, answering, answerError,
    computeImpedance, cancelImpedance, simulate, ask,
  };
}

/** The transient state returned by useTransient. */
export type TransientState = ReturnType<typeof useTransient>;
