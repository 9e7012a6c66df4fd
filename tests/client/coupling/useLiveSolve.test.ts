// @vitest-environment happy-dom
/** Live solve: one job in flight, latest wins, stale while the model changes, no solve on rule violations. */
import { describe, expect, test } from 'vitest';
import { effectScope, nextTick, ref, shallowRef } from 'vue';
import type { Model } from '@shared/schemas/model';
import type { RuleViolation } from '@shared/layout/rules';
import { createLiveSolve } from '@/composables/useLiveSolve';
import type { SolveReply, SolveRequest, SolveWorkerLike } from '@/workers/protocol';
import { smallResult } from './fixture';

class FakeWorker implements SolveWorkerLike {
  posted: SolveRequest[] = [];
  onmessage: ((event: MessageEvent<SolveReply>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  postMessage(message: SolveRequest): void { this.posted.push(message); }
  terminate(): void {}
  /** Answer the last posted job. */
  answer(ok = true): void {
    const job = this.posted.at(-1)!.job;
    const data: SolveReply = ok ? { job, ok: true, result: smallResult(), ms: 5 } : { job, ok: false, message: 'bad layer', ms: 1 };
    this.onmessage?.({ data } as MessageEvent<SolveReply>);
  }
}

function setup() {
  const model = shallowRef<Model | null>({ parts: [] } as unknown as Model);
  const scenarioId = ref('boost');
  const violations = ref<RuleViolation[]>([]);
  const worker = new FakeWorker();
  const scope = effectScope();
  const live = scope.run(() => createLiveSolve({ model, scenarioId, violations }, { createWorker: () => worker, refineDelay: 20 }))!;
  return { model, scenarioId, violations, worker, live, scope };
}

const move = (m: Model | null) => ({ ...(m as Model) });

describe('useLiveSolve', () => {
  test('solves at once and shows the result as current', () => {
    const { worker, live } = setup();
    expect(worker.posted).toHaveLength(1);
    expect(live.solving.value).toBe(true);
    worker.answer();
    expect(live.result.value?.parts).toHaveLength(3);
    expect(live.stale.value).toBe(false);
    expect(live.lastMs.value).not.toBeNull();
  });

  test('changes during a job collapse into one job for the newest model', async () => {
    const { worker, live, model } = setup();
    for (let i = 0; i < 5; i++) {
      model.value = move(model.value);
      await nextTick();
    }
    expect(worker.posted).toHaveLength(1);
    worker.answer();
    expect(live.stale.value).toBe(true);
    expect(worker.posted).toHaveLength(2);
    expect(worker.posted[1].model).toBe(model.value);
    worker.answer();
    expect(live.stale.value).toBe(false);
    expect(worker.posted).toHaveLength(2);
  });

  test('quick successive changes get a draft solve, refined at full map size after a pause', async () => {
    const { worker, live, model } = setup();
    expect(worker.posted[0].mapSize).toBe(128);
    worker.answer();
    model.value = move(model.value);
    await nextTick();
    model.value = move(model.value);
    await nextTick();
    worker.answer();
    expect(worker.posted[1].mapSize).toBe(32);
    worker.answer();
    expect(live.draft.value).toBe(true);
    expect(live.stale.value).toBe(false);
    await new Promise((r) => setTimeout(r, 60));
    expect(worker.posted.map((j) => j.mapSize)).toEqual([128, 32, 32, 128]);
    worker.answer();
    expect(live.draft.value).toBe(false);
  });

  test('a rule violation stops solving and marks the shown result stale', async () => {
    const { worker, live, model, violations } = setup();
    worker.answer();
    violations.value = [{ rule: 'overlap', partIds: ['a', 'b'], message: 'a and b overlap' }];
    model.value = move(model.value);
    await nextTick();
    expect(live.blocked.value).toBe(true);
    expect(live.stale.value).toBe(true);
    expect(worker.posted).toHaveLength(1);
    violations.value = [];
    model.value = move(model.value);
    await nextTick();
    expect(worker.posted).toHaveLength(2);
  });

  test('a scenario switch solves again; an engine error is shown for the current model', async () => {
    const { worker, live, scenarioId } = setup();
    worker.answer();
    scenarioId.value = 'idle';
    await nextTick();
    expect(worker.posted.at(-1)?.scenarioId).toBe('idle');
    worker.answer(false);
    expect(live.error.value).toBe('bad layer');
    expect(live.stale.value).toBe(true);
  });
});
