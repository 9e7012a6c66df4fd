/** Data for the load phases: signed-in sessions, variants with many scenarios (uncached solves), a warm engine. */
import { demoUsers } from '../../server/db/seeders/demoUsers';
import { HttpSession } from './httpSession';
import { copyVariant } from './demoData';

/** Scenarios per load variant: each uncached solve request asks for one not solved before. */
export const LOAD_SCENARIOS = 20;

/** Sign in `count` sessions, alternating the demo engineer and owner (both may run analyses and save). */
export async function signInSessions(url: string, count: number): Promise<HttpSession[]> {
  const out: HttpSession[] = [];
  for (let i = 0; i < count; i++) {
    const u = i % 2 === 0 ? demoUsers.engineer : demoUsers.owner;
    out.push(await new HttpSession(url).login(u.email, u.password));
  }
  return out;
}

/** Copy `base` and give the copy LOAD_SCENARIOS scenarios: the first scenario's loads scaled by 1.01, 1.02, … */
export async function loadVariant(s: HttpSession, base: number, name: string): Promise<number> {
  const vid = await copyVariant(s, base, name);
  const cur = (await s.request('GET', `/api/variants/${vid}`)).body;
  const first = cur.model.scenarios[0];
  cur.model.scenarios = Array.from({ length: LOAD_SCENARIOS }, (_, k) => ({
    id: `load-${k}`,
    name: `Load ${k}`,
    loads: Object.fromEntries(Object.entries(first.loads).map(([part, l]) => [part, { ...(l as object), power: (l as { power: number }).power * (1 + 0.01 * (k + 1)) }])),
  }));
  const res = await s.request('PUT', `/api/variants/${vid}`, { model: cur.model, version: cur.version });
  if (res.status !== 200) throw new Error(`preparing ${name} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return vid;
}

/** Solve a few scenarios of a throw-away variant, several at once, so every worker thread has loaded and warmed the engine. */
export async function warmUp(s: HttpSession, vid: number, parallel: number): Promise<void> {
  for (let round = 0; round < 2; round++) {
    await Promise.all(Array.from({ length: parallel }, (_, i) => s.request('POST', `/api/variants/${vid}/solve`, { scenarioId: `load-${round * parallel + i}` })));
  }
}

/**
 * `count` copies of `base`, each with its first part moved a different few micrometres (n + 1 µm in x), so
 * every solve of them builds a new network — what a drag on the layout costs, unlike a new scenario.
 */
export async function movedVariants(sessions: HttpSession[], base: number, count: number, label: string): Promise<number[]> {
  const out: number[] = [];
  for (let n = 0; n < count; n++) {
    const s = sessions[n % sessions.length];
    const vid = await copyVariant(s, base, `${label} ${n}`);
    const cur = (await s.request('GET', `/api/variants/${vid}`)).body;
    cur.model.parts[0].x += (n + 1) * 1e-6;
    const res = await s.request('PUT', `/api/variants/${vid}`, { model: cur.model, version: cur.version });
    if (res.status !== 200) throw new Error(`preparing ${label} ${n} failed: ${res.status} ${JSON.stringify(res.body)}`);
    out.push(vid);
  }
  return out;
}
