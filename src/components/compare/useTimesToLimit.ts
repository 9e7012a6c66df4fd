/** Time-to-limit per compared variant on one transient worker each; recomputed when a model or the scenario changes. */
import { onScopeDispose, shallowRef, toRaw, watch, type Ref } from 'vue';
import type { Model } from '@shared/schemas/model';
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { createJobRunner, JobCancelledError, type JobRunner } from '@/components/timeline/jobRunner';
import type { TimeState } from './metrics';
import { timeToLimit } from './timeToLimit';

/** Compute time-to-limit for each model once its steady result for the scenario is there. */
export function useTimesToLimit(models: Readonly<Ref<Model[]>>, scenarioId: Readonly<Ref<string>>, results: Readonly<Ref<(AssemblyResult | null)[]>>, create = createJobRunner) {
  const states = shallowRef<TimeState[]>([]);
  let runners: JobRunner[] = [];
  const asked = new Map<number, AssemblyResult>();

  watch([models, scenarioId], () => {
    runners.forEach((r) => r.cancel());
    runners = models.value.map(() => create());
    asked.clear();
    states.value = models.value.map(() => 'pending');
  }, { immediate: true });

  watch(results, (list) => {
    list.forEach((r, i) => {
      if (!r || asked.get(i) === r || r.scenario.id !== scenarioId.value) return;
      asked.set(i, r);
      const runner = runners[i];
      timeToLimit(runner, toRaw(models.value[i]), scenarioId.value, toRaw(r)).then(
        (t) => { if (runners[i] === runner) states.value = states.value.map((s, k) => (k === i ? t : s)); },
        (e: Error) => { if (!(e instanceof JobCancelledError) && runners[i] === runner) states.value = states.value.map((s, k) => (k === i ? { error: e.message } : s)); },
      );
    });
  }, { immediate: true });

  onScopeDispose(() => runners.forEach((r) => r.cancel()));
  return states;
}
