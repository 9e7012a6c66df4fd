/** One live solve per compared variant (each in its own worker), all for the same scenario; results null until current. */
import { computed, effectScope, onScopeDispose, shallowRef, watch, type EffectScope, type Ref } from 'vue';
import type { Model } from '@shared/schemas/model';
import type { AssemblyResult } from '@shared/engine';
import { createLiveSolve, type LiveSolve, type LiveSolveOptions } from '@/composables/useLiveSolve';

const noViolations = computed(() => []);

/** Solve every model of `models` for `scenarioId`; re-solves when either changes. */
export function useCompareSolves(models: Readonly<Ref<Model[]>>, scenarioId: Readonly<Ref<string>>, options: LiveSolveOptions = {}) {
  const solves = shallowRef<LiveSolve[]>([]);
  let scope: EffectScope | null = null;

  watch(
    models,
    (list) => {
      scope?.stop();
      scope = effectScope(true);
      solves.value = scope.run(() =>
        list.map((m) => createLiveSolve({ model: computed(() => m), scenarioId, violations: noViolations }, { mapSize: 128, ...options })),
      ) ?? [];
    },
    { immediate: true },
  );
  onScopeDispose(() => scope?.stop());

  /** Current results in model order (null while solving or failed). */
  const results = computed<(AssemblyResult | null)[]>(() => solves.value.map((s) => (s.stale.value ? null : s.result.value)));
  /** Error text per model (null when fine). */
  const errors = computed(() => solves.value.map((s) => s.error.value));
  const solving = computed(() => solves.value.some((s) => s.solving.value || s.stale.value));
  return { results, errors, solving };
}
