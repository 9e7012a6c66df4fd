/**
 * `npm run load [-- --levels 1,10,50] [--no-write]`: starts Heatloom on 127.0.0.1 (free port,
 * temp data folder, seeded demo), signs in sessions and drives the variant solve route (stored
 * result reused = "cached"; a scenario never solved before = "uncached") and the save route
 * (PUT /api/variants/:vid, one variant per client so versions never clash) with autocannon at
 * each concurrency level; prints the figures and writes them to docs/performance.md (Load).
 * Bounded: a fixed number of requests per phase and a time limit per phase; stops by itself.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { startServer } from './reliability/serverProcess';
import { demoVariantId } from './reliability/demoData';
import { LOAD_SCENARIOS, loadVariant, movedVariants, signInSessions, warmUp } from './reliability/loadSetup';
import { runPhase, type PhaseFigures, type PhaseTarget } from './reliability/loadPhase';
import { phaseTable, writeLoadSection, type ProbeFigures } from './reliability/loadReport';
import type { HttpSession } from './reliability/httpSession';

/** Requests per phase at each level (split over the clients; uncached capped by the scenarios per variant). */
const REQUESTS = { 1: 20, 10: 200, 50: 400 } as Record<number, number>;

function headers(s: HttpSession): Record<string, string> {
  return { cookie: s.cookie, 'x-csrf-token': s.csrf, 'content-type': 'application/json' };
}

async function probe(url: string, during: Promise<unknown>, phase: string): Promise<ProbeFigures> {
  const times: number[] = [];
  let done = false;
  void during.finally(() => { done = true; });
  while (!done) {
    const t0 = performance.now();
    await fetch(`${url}/api/health`).then((r) => r.arrayBuffer());
    times.push(performance.now() - t0);
    await new Promise((r) => setTimeout(r, 100));
  }
  times.sort((a, b) => a - b);
  return { phase, count: times.length, p95: times[Math.ceil(0.95 * times.length) - 1] ?? NaN, max: times[times.length - 1] ?? NaN };
}

/** Wait (at most DRAIN_LIMIT_MS) until the server uses under a fifth of a core: work left by timed-out requests of the last phase is done. */
const DRAIN_LIMIT_MS = 120_000;
async function drain(cpuMs: () => number): Promise<void> {
  const end = Date.now() + DRAIN_LIMIT_MS;
  while (Date.now() < end) {
    const c0 = cpuMs();
    await new Promise((r) => setTimeout(r, 1000));
    if (cpuMs() - c0 < 200) return;
  }
  console.log(`server still busy after ${DRAIN_LIMIT_MS / 1000} s; going on`);
}

async function main(): Promise<void> {
  const { values } = parseArgs({ options: { levels: { type: 'string', default: '1,10,50' }, 'no-write': { type: 'boolean', default: false } } });
  const levels = values.levels.split(',').map(Number).filter((n) => REQUESTS[n]);
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-load-'));
  const server = await startServer({ dataDir, env: { LOGIN_RATE_LIMIT: '1000' } });
  const rows: PhaseFigures[] = [];
  const probes: ProbeFigures[] = [];
  try {
    const sessions = await signInSessions(server.url, 10);
    const s0 = sessions[0];
    const base = await demoVariantId(s0);
    console.log(`Server ${server.url}; preparing variants…`);
    const warm = await loadVariant(s0, base, 'Load warm-up');
    await warmUp(s0, warm, 4);
    const cached = await loadVariant(s0, base, 'Load cached');
    await s0.request('POST', `/api/variants/${cached}/solve`, { scenarioId: 'load-0' });
    const prepared = new Map<number, number[]>();
    const moved = new Map<number, number[]>();
    for (const level of levels) {
      const vids: number[] = [];
      for (let i = 0; i < level; i++) vids.push(await loadVariant(sessions[i % sessions.length], base, `Load ${level}-${i}`));
      prepared.set(level, vids);
      moved.set(level, await movedVariants(sessions, base, level * Math.max(1, Math.floor(REQUESTS[level] / level)), `Moved ${level}`));
    }
    for (const level of levels) {
      const vids = prepared.get(level)!;
      const per = Math.max(1, Math.floor(REQUESTS[level] / level));
      const solveTarget = (i: number, scenario: (k: number) => string, vid: number): PhaseTarget => ({
        method: 'POST', path: `/api/variants/${vid}/solve`, headers: headers(sessions[i % sessions.length]),
        body: (k) => JSON.stringify({ scenarioId: scenario(k) }),
      });
      const idx = Array.from({ length: level }, (_, i) => i);
      await drain(server.cpuMs);
      rows.push(await runPhase(server.url, 'solve, cached (stored result)', idx.map((i) => solveTarget(i, () => 'load-0', cached)), per, server.cpuMs));
      await drain(server.cpuMs);
      const uncachedRun = runPhase(server.url, 'solve, uncached (new scenario)', idx.map((i) => solveTarget(i, (k) => `load-${k % LOAD_SCENARIOS}`, vids[i])), Math.min(per, LOAD_SCENARIOS), server.cpuMs);
      probes.push(await probe(server.url, uncachedRun, `uncached solves, ${level} clients`));
      rows.push(await uncachedRun);
      const movedIds = moved.get(level)!;
      await drain(server.cpuMs);
      rows.push(await runPhase(server.url, 'solve, uncached (part moved: new network)', idx.map((i) => ({
        method: 'POST', path: (k: number) => `/api/variants/${movedIds[i * per + k]}/solve`, headers: headers(sessions[i % sessions.length]),
        body: () => JSON.stringify({ scenarioId: 'boost' }),
      })), per, server.cpuMs));
      const saveTargets: PhaseTarget[] = [];
      for (const i of idx) {
        const s = sessions[i % sessions.length];
        const cur = (await s.request('GET', `/api/variants/${vids[i]}`)).body;
        let version = cur.version as number;
        saveTargets.push({
          method: 'PUT', path: `/api/variants/${vids[i]}`, headers: headers(s),
          body: (k, last) => {
            if (last === 200) version++;
            cur.model.stack.cooling.top.fluidTemperature = 25 + k * 1e-3;
            return JSON.stringify({ model: cur.model, version });
          },
        });
      }
      await drain(server.cpuMs);
      rows.push(await runPhase(server.url, 'save (PUT variant, own variant per client)', saveTargets, per, server.cpuMs));
      console.log(phaseTable(rows.slice(-4)));
    }
  } catch (err) {
    console.error(`Server output (last 3000 characters):\n${server.output().slice(-3000)}`);
    throw err;
  } finally {
    await server.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
  console.log(`\n${phaseTable(rows)}\n`);
  for (const p of probes) console.log(`health during ${p.phase}: p95 ${p.p95.toFixed(0)} ms, max ${p.max.toFixed(0)} ms (${p.count} polls)`);
  if (!values['no-write']) {
    writeLoadSection(path.resolve('docs/performance.md'), rows, probes, [
      '"cached": the variant and scenario were solved before, the stored result (keyed by a hash of model, scenario and engine version) is read back.',
      '"uncached (new scenario)": every request names a scenario of its variant not solved before (same geometry, scaled powers), so the engine runs on a worker thread and the result is stored; the network (scenario-independent) is reused, as when a user switches scenario or edits powers.',
      '"uncached (part moved)": every request solves its own copy of the demo with the first part moved by a different few micrometres, so the engine also builds and factors a new network, as after a drag on the layout.',
      'Solve answers leave the two 128×128 plane maps out (the default; `maps: true` adds them, about 600 KB of JSON for the demo).',
      'Saves: each client saves its own variant with the version it last got back, so no save conflicts (409) arise; conflicts are by design when two people save the same variant (see docs/reliability.md).',
      'errors = connection errors + timeouts + responses that are not 2xx.',
      '"server CPU ms/req": CPU time (user + system, all threads) of the server process group during the phase divided by its requests, read from /proc — on a shared, overloaded machine it estimates what one request costs on an idle one.',
    ]);
    console.log('Written to docs/performance.md (Load section).');
  }
}

main().catch((err: Error) => {
  console.error(`Load run failed: ${err.stack ?? err.message}`);
  process.exit(1);
});
