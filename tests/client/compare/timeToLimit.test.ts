// @vitest-environment happy-dom
/** Time to limit in the compare table: which nodes are asked, the shortest crossing wins, the row's states. */
import { describe, expect, test } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import type { JobRunner } from '@/components/timeline/jobRunner';
import { bestColumns, compareMetrics } from '@/components/compare/metrics';
import { nodesOverLimit, timeToLimit, timingRequests } from '@/components/compare/timeToLimit';
import { fakePart, fakeResult } from './fakeResult';

const model = lx9Model('A');
/** Invented steady temperatures: both compute dies over 105 °C (by 3 and 8 K), everything else inside its limit. */
const hot = fakeResult(
  model.parts.map((p) => {
    const peak = p.id === 'cpu-w' ? 109 : p.id === 'cpu-e' ? 114 : 70;
    const part = fakePart(p.id, peak, p.limits.junction, p.memory ? Array(p.memory.tiers).fill(70) : []);
    return { ...part, name: p.name };
  }),
  [], 300, 290,
);

/** A runner that answers impedance with a dummy network and timing with a crossing time per node. */
function fakeRunner(times: Record<number, number | null>): JobRunner & { calls: string[] } {
  const calls: string[] = [];
  return {
    calls,
    run: (async (req: { kind: string; params?: { request: { node: number } } }) => {
      calls.push(req.kind);
      if (req.kind === 'impedance') return { result: { network: {}, baseTemperatures: [] } };
      return { result: { boost: { time: times[req.params!.request.node] } } };
    }) as unknown as JobRunner['run'],
    cancel: () => undefined, dispose: () => undefined, busy: () => false,
  };
}

describe('time to limit', () => {
  test('only nodes whose steady mean temperature is over the limit are asked, from the profile start', () => {
    const nodes = nodesOverLimit(model, hot);
    expect(nodes).toHaveLength(2);
    const reqs = timingRequests(model, 'boost', hot);
    expect(reqs.map((r) => r.limit)).toEqual([105, 105]);
    expect(reqs[0].start).not.toBe('ambient'); // boost starts from the idle steady state (demo profile)
  });

  test('the shortest crossing wins; nothing over the limit needs no transient', async () => {
    const [w, e] = nodesOverLimit(model, hot);
    const runner = fakeRunner({ [w]: 0.42, [e]: 0.17 });
    const t = await timeToLimit(runner, model, 'boost', hot);
    expect(t.time).toBe(0.17);
    expect(t.part).toBe('Compute chiplet North');
    expect(runner.calls).toEqual(['impedance', 'timing', 'timing']);
    const cool = fakeResult(hot.parts.map((p) => ({ ...p, junction: 60, peak: 60 })), [], 300, 290);
    const idle = fakeRunner({});
    expect(await timeToLimit(idle, model, 'boost', cool)).toEqual({ time: null, part: '' });
    expect(idle.calls).toEqual([]);
  });

  test('the row: computing, a time, no limit reached (best), an error', () => {
    const row = compareMetrics([hot, hot, hot, hot], ['pending', { time: 0.17, part: 'X' }, { time: null, part: '' }, { error: 'fit failed' }]).find((r) => r.key === 'time')!;
    expect(row.cells.map((c) => c.text)).toEqual(['computing…', '170 ms', 'no limit reached', '—']);
    expect(bestColumns(row)).toEqual([2]);
  });
});
