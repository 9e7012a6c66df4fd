/**
 * Live results: solves the edited variant's selected scenario in a Web Worker whenever the model or
 * the scenario changes and the layout breaks no rule. One job in flight at a time; changes that
 * arrive meanwhile collapse into one follow-up job for the newest model (latest wins, nothing stale
 * is queued). Changes in quick succession (a drag) get draft solves with coarse maps, refined at full
 * map size once the user pauses. Performance marks 'hl-drop' (each change) and 'hl-result' (its numbers shown) and the
 * measure 'hl-drop-to-result' let a browser test read the drop-to-numbers time.
 */
import { computed, onScopeDispose, ref, shallowRef, toRaw, watch, type Ref } from 'vue';
import { createSharedComposable } from '@vueuse/core';
import type { Model } from '@shared/schemas/model';
import type { RuleViolation } from '@shared/layout/rules';
import type { AssemblyResult } from '@shared/engine';
import { useVariantStore } from '@/stores/variant';
import type { SolveReply, SolveWorkerLike } from '@/workers/protocol';

/** What the live solve watches. */
export interface LiveSolveSource {
  model: Readonly<Ref<Model | null>>;
  scenarioId: Readonly<Ref<string | null | undefined>>;
  violations: Readonly<Ref<readonly RuleViolation[]>>;
}

/** Options with their defaults: maps of 128 cells, drafts of 32 while changes come fast. */
export interface LiveSolveOptions {
  createWorker?: () => SolveWorkerLike;
  /** Plane map side (cells, a power of two). */
  mapSize?: number;
  /** Map side of draft solves while the user drags (mean temperatures and matrix are exact; maps and hot spots coarser). */
  draftMapSize?: number;
  /** A change within this many ms of the previous one counts as dragging (draft solve). */
  rapidWindow?: number;
  /** Quiet time (ms) after a draft before it is refined at full map size. */
  refineDelay?: number;
}

/** The Vite-bundled engine worker. */
export function createSolveWorker(): SolveWorkerLike {
  return new Worker(new URL('../workers/solve.worker.ts', import.meta.url), { type: 'module' }) as unknown as SolveWorkerLike;
}

function mark(name: string): void {
  if (typeof performance === 'undefined' || !performance.mark) return;
  performance.clearMarks(name);
  performance.mark(name);
}

/** Live solving of a model source (see useLiveSolve for the app-wide instance). */
export function createLiveSolve(source: LiveSolveSource, options: LiveSolveOptions = {}) {
  const result = shallowRef<AssemblyResult | null>(null);
  const resultVersion = ref(-1);
  const version = ref(0);
  const solving = ref(false);
  const error = ref<string | null>(null);
  /** The shown result is a quick draft (coarse maps); a full solve follows when the user pauses. */
  const draft = ref(false);
  /** Drop-to-numbers time of the last change whose result is shown (ms, main thread). */
  const lastMs = ref<number | null>(null);
  /** Time the engine itself took for the shown result (ms, inside the worker). */
  const engineMs = ref<number | null>(null);
  const blocked = computed(() => !!source.model.value && source.violations.value.length > 0);
  const stale = computed(() => !!result.value && (resultVersion.value !== version.value || blocked.value));

  let worker: SolveWorkerLike | null = null;
  let changedAt = -Infinity;
  let draftNext = false;
  let inFlightDraft = false;
  let failedVersion = -1;
  let measuredVersion = -1;
  let refineTimer: ReturnType<typeof setTimeout> | null = null;

  function measure(): void {
    if (measuredVersion === version.value) return;
    measuredVersion = version.value;
    lastMs.value = performance.now() - changedAt;
    mark('hl-result');
    try {
      performance.measure('hl-drop-to-result', 'hl-drop', 'hl-result');
    } catch {
      /* marks cleared by someone else: the figure stays in lastMs */
    }
  }

  function onReply(event: MessageEvent<SolveReply>): void {
    const reply = event.data;
    solving.value = false;
    if (reply.ok) {
      result.value = reply.result;
      resultVersion.value = reply.job;
      draft.value = inFlightDraft;
      engineMs.value = reply.ms;
      error.value = null;
      if (reply.job === version.value) measure();
    } else if (reply.job === version.value) {
      failedVersion = reply.job;
      error.value = reply.path ? `${reply.message} (${reply.path})` : reply.message;
    }
    schedule();
  }

  function ensureWorker(): SolveWorkerLike {
    if (worker) return worker;
    worker = (options.createWorker ?? createSolveWorker)();
    worker.onmessage = onReply;
    worker.onerror = (e) => {
      e.preventDefault?.();
      solving.value = false;
      error.value = `The solver stopped: ${e.message || 'worker error'}`;
      worker?.terminate();
      worker = null;
    };
    return worker;
  }

  function post(asDraft: boolean): void {
    const model = source.model.value;
    if (!model || blocked.value || solving.value) return;
    solving.value = true;
    inFlightDraft = asDraft;
    const mapSize = asDraft ? (options.draftMapSize ?? 32) : (options.mapSize ?? 128);
    try {
      ensureWorker().postMessage({ job: version.value, model: toRaw(model), scenarioId: source.scenarioId.value ?? '', mapSize });
    } catch (e) {
      solving.value = false;
      failedVersion = version.value;
      error.value = `Could not start the solver: ${(e as Error).message}`;
    }
  }

  /** Start a job for the newest model unless one is running (its reply calls us again); refine a draft after a pause. */
  function schedule(): void {
    if (solving.value || !source.model.value || blocked.value) return;
    const current = resultVersion.value === version.value;
    if (!current && failedVersion !== version.value) post(draftNext);
    else if (current && draft.value && !refineTimer) {
      refineTimer = setTimeout(() => {
        refineTimer = null;
        if (resultVersion.value === version.value && draft.value) post(false);
      }, options.refineDelay ?? 150);
    }
  }

  watch(
    [() => source.model.value, () => source.scenarioId.value, blocked],
    () => {
      const now = performance.now();
      draftNext = now - changedAt < (options.rapidWindow ?? 250);
      changedAt = now;
      version.value += 1;
      mark('hl-drop');
      if (refineTimer) clearTimeout(refineTimer);
      refineTimer = null;
      if (blocked.value) error.value = null;
      schedule();
    },
    { immediate: true },
  );

  onScopeDispose(() => {
    if (refineTimer) clearTimeout(refineTimer);
    worker?.terminate();
    worker = null;
  });

  return { result, stale, draft, solving, error, lastMs, engineMs, blocked };
}

/** The live-solve state returned by useLiveSolve / createLiveSolve. */
export type LiveSolve = ReturnType<typeof createLiveSolve>;

/** App-wide live solve of the variant store's model and scenario (one worker shared by all callers). */
export const useLiveSolve = createSharedComposable((): LiveSolve => {
  const store = useVariantStore();
  return createLiveSolve({
    model: computed(() => store.model),
    scenarioId: computed(() => store.scenario?.id ?? null),
    violations: computed(() => store.violations),
  });
});
