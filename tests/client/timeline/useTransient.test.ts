// @vitest-environment happy-dom
/** useTransient: impedance progress from the worker, cancel terminates it, results only for the current stack-up. */
import { describe, expect, test } from 'vitest';
import { effectScope, nextTick, ref, shallowRef } from 'vue';
import { lx9Model } from '@shared/demo/lx9';
import type { Model } from '@shared/schemas/model';
import { useTransient } from '@/composables/useTransient';
import type { ImpedanceResult, TransientReply, TransientRequest, TransientWorkerLike } from '@/components/timeline/protocol';

class FakeWorker implements TransientWorkerLike {
  posted: TransientRequest[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent<TransientReply>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  postMessage(message: TransientRequest): void { this.posted.push(message); }
  terminate(): void { this.terminated = true; }
  reply(data: TransientReply): void { this.onmessage?.({ data } as MessageEvent<TransientReply>); }
}

const flush = async () => { for (let i = 0; i < 3; i++) await nextTick(); };
/** A stand-in result (invented numbers; only its identity matters here). */
const fakeResult = { times: [1e-6], Z: [[[0]]], network: { tau: [1], R: [[[0.5]]], labels: ['a'] }, baseTemperatures: [40] } as unknown as ImpedanceResult;

function setup() {
  const workers: FakeWorker[] = [];
  const model = shallowRef<Model | null>(lx9Model('A'));
  const scope = effectScope();
  const t = scope.run(() => useTransient({ model, scenarioId: ref('boost') }, () => { const w = new FakeWorker(); workers.push(w); return w; }))!;
  return { workers, model, t, scope };
}

describe('useTransient', () => {
  test('progress is shown while the impedance computes, then the result is current', async () => {
    const { workers, t } = setup();
    const done = t.computeImpedance();
    const w = workers[0];
    const job = w.posted[0].job;
    expect(w.posted[0].kind).toBe('impedance');
    w.reply({ job, kind: 'progress', fraction: 0.4 });
    expect(t.progress.value).toBe(0.4);
    expect(t.computing.value).toBe(true);
    w.reply({ job, kind: 'impedance', result: fakeResult, ms: 12 });
    await done;
    expect(t.progress.value).toBeNull();
    expect(t.ready.value).toBe(true);
    expect(t.impedanceMs.value).toBe(12);
  });

  test('cancel terminates the worker, clears progress and reports no error', async () => {
    const { workers, t } = setup();
    const done = t.computeImpedance();
    workers[0].reply({ job: workers[0].posted[0].job, kind: 'progress', fraction: 0.1 });
    t.cancelImpedance();
    await done;
    expect(workers[0].terminated).toBe(true);
    expect(t.progress.value).toBeNull();
    expect(t.impedanceError.value).toBeNull();
    expect(t.impedance.value).toBeNull();
  });

  test('a geometry change makes the impedance stale; a load change does not', async () => {
    const { workers, model, t } = setup();
    const done = t.computeImpedance();
    workers[0].reply({ job: workers[0].posted[0].job, kind: 'impedance', result: fakeResult, ms: 1 });
    await done;
    const m = structuredClone(model.value!);
    m.scenarios[1].loads['cpu-w'].power = 100;
    model.value = m;
    await flush();
    expect(t.stale.value).toBe(false);
    const moved = structuredClone(m);
    moved.parts[0].x += 0.001;
    model.value = moved;
    await flush();
    expect(t.stale.value).toBe(true);
  });

  test('an engine error is shown in words', async () => {
    const { workers, t } = setup();
    const done = t.computeImpedance();
    workers[0].reply({ job: workers[0].posted[0].job, kind: 'error', message: 'This layer needs a density and a specific heat for a transient solve.', path: 'parts[0].die', ms: 1 });
    await done;
    expect(t.impedanceError.value).toBe('This layer needs a density and a specific heat for a transient solve.');
    expect(t.ready.value).toBe(false);
  });
});
