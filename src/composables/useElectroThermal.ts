/**
 * Electro-thermal results of the edited variant's scenario (physics.md §4): solved in the transient
 * worker whenever the model or scenario changes (debounced; the newest request wins).
 */
import { ref, shallowRef, toRaw, watch, onScopeDispose, type Ref } from 'vue';
import type { Model } from '@shared/schemas/model';
import type { CouplingResult } from '@shared/engine/electrothermal';
import { createJobRunner, JobCancelledError } from '@/components/timeline/jobRunner';
import type { TransientWorkerLike } from '@/components/timeline/protocol';

/** What the analysis follows; `debounce` in ms (default 300). */
export interface ElectroThermalSource {
  model: Readonly<Ref<Model | null>>;
  scenarioId: Readonly<Ref<string | null | undefined>>;
  debounce?: number;
}

/** Coupled solve, margins and their state; re-run on change. */
export function useElectroThermal(source: ElectroThermalSource, createWorker?: () => TransientWorkerLike) {
  const runner = createJobRunner(createWorker);
  const result = shallowRef<CouplingResult | null>(null);
  const error = ref<string | null>(null);
  const busy = ref(false);
  const ms = ref<number | null>(null);
  let latest = 0;
  let timer: ReturnType<typeof setTimeout> | null = null;

  async function solve(): Promise<void> {
    timer = null;
    const model = source.model.value;
    const scenarioId = source.scenarioId.value;
    if (!model || !scenarioId) return;
    const mine = ++latest;
    busy.value = true;
    try {
      const reply = await runner.run({ kind: 'coupling', model: toRaw(model), scenarioId });
      if (mine !== latest) return;
      result.value = reply.result;
      ms.value = reply.ms;
      error.value = null;
    } catch (e) {
      if (mine === latest && !(e instanceof JobCancelledError)) error.value = (e as Error).message;
    } finally {
      if (mine === latest) busy.value = false;
    }
  }

  watch(
    [() => source.model.value, () => source.scenarioId.value],
    () => {
      if (timer) clearTimeout(timer);
      timer = setTimeout(solve, source.debounce ?? 300);
    },
    { immediate: true },
  );

  onScopeDispose(() => {
    if (timer) clearTimeout(timer);
    runner.dispose();
  });

  return { result, error, busy, ms, solve };
}
