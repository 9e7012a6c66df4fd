/**
 * One autocannon phase: `clients` connections, each with its own signed-in session and its own
 * variant, `perClient` requests each (bounded; a phase also stops after PHASE_LIMIT_S). Latency
 * percentiles are taken from every response (autocannon's histogram has no p95).
 */
import autocannon from 'autocannon';

/** Hard stop of a phase in seconds, whatever its request count. */
export const PHASE_LIMIT_S = 90;

/** What each connection sends: the path and the body of its k-th request (k = 0, 1, …). */
export interface PhaseTarget {
  method: 'POST' | 'PUT';
  path: string | ((k: number) => string);
  headers: Record<string, string>;
  body(k: number, lastStatus: number): string;
}

/** Figures of one phase. */
export interface PhaseFigures {
  name: string;
  clients: number;
  requests: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  /** Server CPU time (all threads) per request, ms: close to an idle machine's latency for one client. */
  cpuPerRequest: number;
  statuses: Record<string, number>;
  seconds: number;
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

function request(t: PhaseTarget, k: number, lastStatus: number) {
  return { method: t.method, path: typeof t.path === 'string' ? t.path : t.path(k), headers: t.headers, body: t.body(k, lastStatus) };
}

/** Run one phase against `url`; `targets[i]` drives connection i. */
export async function runPhase(url: string, name: string, targets: PhaseTarget[], perClient: number, cpuMs: () => number): Promise<PhaseFigures> {
  const cpu0 = cpuMs();
  const latencies: number[] = [];
  const statuses: Record<string, number> = {};
  let next = 0;
  const counters = new Map<unknown, { k: number; t: PhaseTarget }>();
  const instance = autocannon({
    url,
    connections: targets.length,
    amount: perClient * targets.length,
    timeout: 30,
    setupClient: (client) => {
      const t = targets[next++ % targets.length];
      counters.set(client, { k: 0, t });
      client.setRequests([request(t, 0, 0)]);
    },
  }) as unknown as autocannon.Instance & Promise<autocannon.Result>;
  instance.on('response', (client: autocannon.Client, status: number, _bytes: number, ms: number) => {
    latencies.push(ms);
    statuses[status] = (statuses[status] ?? 0) + 1;
    const c = counters.get(client)!;
    c.k++;
    client.setRequests([request(c.t, c.k, status)]);
  });
  const stopper = setTimeout(() => instance.stop(), PHASE_LIMIT_S * 1000);
  const result = await instance;
  clearTimeout(stopper);
  latencies.sort((a, b) => a - b);
  const ok = Object.entries(statuses).filter(([s]) => Number(s) < 300).reduce((n, [, c]) => n + c, 0);
  return {
    name, clients: targets.length, requests: latencies.length,
    rps: latencies.length / result.duration,
    p50: percentile(latencies, 50), p95: percentile(latencies, 95), p99: percentile(latencies, 99),
    errors: result.errors + result.timeouts + (latencies.length - ok),
    cpuPerRequest: (cpuMs() - cpu0) / Math.max(1, latencies.length),
    statuses, seconds: result.duration,
  };
}
