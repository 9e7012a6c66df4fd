/**
 * Live results: solves the edited variant's selected scenario in a Web Worker whenever the model or
 * the scenario changes and the layout breaks no rule. One job in flight at a time; changes that
 * arrive meanwhile collapse into one follow-up job for the newest model (latest wins, nothing stale
 * is queued). Performance marks 'hl-drop' (each change) and 'hl-result' (its numbers shown) and the
 * measure 'hl-drop-to-result' let a browser test read the drop-to-numbers time.
 */
import { computed, onScopeDispose, ref, shallowRef, toRaw, watch, type Ref } from 'vue';
import { createSharedComposable } from '@vueuse/core';
import type { Model } from '@shared/schemas/model';
import type { RuleViolation } from '@shared/layout/rules';
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { useVariantStore } from '@/stores/variant';
import type { SolveReply, SolveWorkerLike } from '@/workers/protocol';

/** What the live solve watches. */
export interface LiveSolveSource {
  model: Readonly<Ref<Model | null>>;
  scenarioId: Readonly<Ref<string | null | undefined>>;
  violations: Readonly<Ref<readonly RuleViolation[]>>;
}

/** Options with their defaults: map side 128 cells, no extra spacing between jobs. */
export interface LiveSolveOptions {
  createWorker?: () => SolveWorkerLike;
  /** Plane map side (cells, a power of two). */
  mapSize?: number;
  /** Least time between two job starts (ms), to spare the CPU on slow machines. */
  minInterval?: number;
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
  /** Drop-to-numbers time of the last change whose result is shown (ms, main thread). */
  const lastMs = ref<number | null>(null);
  /** Time the engine itself took for the shown result (ms, inside the worker). */
  const engineMs = ref<number | null>(null);
  const blocked = computed(() => !!source.model.value && source.violations.value.length > 0);
  const stale = computed(() => !!result.value && (resultVersion.value !== version.value || blocked.value));

  let worker: SolveWorkerLike | null = null;
  let changedAt = 0;
  let lastPost = -Infinity;
  let timer: ReturnType<typeof setTimeout> | null = null;

  function onReply(event: MessageEvent<SolveReply>): void {
    const reply = event.data;
    solving.value = false;
    if (reply.ok) {
      result.value = reply.result;
      resultVersion.value = reply.job;
      engineMs.value = reply.ms;
      error.value = null;
      if (reply.job === version.value) {
        lastMs.value = performance.now() - changedAt;
        mark('hl-result');
        try {
          performance.measure('hl-drop-to-result', 'hl-drop', 'hl-result');
        } catch {
          /* marks cleared by someone else: the figure stays in lastMs */
        }
      }
    } else if (reply.job === version.value) {
      error.value = reply.path ? `${reply.message} (${reply.path})` : reply.message;
    }
    if (reply.job !== version.value) schedule();
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

  function post(): void {
    timer = null;
    const model = source.model.value;
    if (!model || blocked.value || solving.value) return;
    solving.value = true;
    lastPost = performance.now();
    ensureWorker().postMessage({ job: version.value, model: toRaw(model), scenarioId: source.scenarioId.value ?? '', mapSize: options.mapSize ?? 128 });
  }

  /** Start a job for the newest model unless one is running (its reply will call us again). */
  function schedule(): void {
    if (solving.value || timer || !source.model.value || blocked.value) return;
    const wait = (options.minInterval ?? 0) - (performance.now() - lastPost);
    if (wait > 0) timer = setTimeout(post, wait);
    else post();
  }

  watch(
    [() => source.model.value, () => source.scenarioId.value, blocked],
    () => {
      version.value += 1;
      changedAt = performance.now();
      mark('hl-drop');
      if (blocked.value) error.value = null;
      schedule();
    },
    { immediate: true },
  );

  onScopeDispose(() => {
    if (timer) clearTimeout(timer);
    worker?.terminate();
    worker = null;
  });

  return { result, stale, solving, error, lastMs, engineMs, blocked };
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
