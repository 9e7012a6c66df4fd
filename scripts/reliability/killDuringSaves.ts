/**
 * Fault: SIGKILL the server during a burst of saves, restart it, and check that every save the
 * server acknowledged (HTTP 200) is there with its content and that PRAGMA integrity_check is ok.
 */
import path from 'node:path';
import { demoUsers } from '../../server/db/seeders/demoUsers';
import { HttpSession } from './httpSession';
import { copyVariant, demoVariantId } from './demoData';
import { startServer } from './serverProcess';
import { DB_FILE, integrityCheck } from './sqliteFiles';

/** Settings of one kill-during-saves run. */
export interface KillOptions {
  dataDir: string;
  /** Concurrent writers, each on its own variant (default 4). */
  writers: number;
  /** Kill rounds (default 3). */
  rounds: number;
  /** Milliseconds of saving before each kill (default 1500). */
  killAfterMs: number;
}

/** What a run found. */
export interface KillReport {
  rounds: number;
  acknowledged: number;
  verified: number;
  lost: number;
  integrity: string[];
}

interface Ack { vid: number; version: number; marker: number }

async function writer(s: HttpSession, vid: number, acks: Ack[], stop: { now: boolean }, seq: { n: number }): Promise<void> {
  let cur = (await s.request('GET', `/api/variants/${vid}`)).body;
  while (!stop.now) {
    const marker = 20 + ++seq.n * 1e-3;
    cur.model.stack.cooling.top.fluidTemperature = marker;
    let res;
    try {
      res = await s.request('PUT', `/api/variants/${vid}`, { model: cur.model, version: cur.version });
    } catch {
      return;
    }
    if (res.status !== 200) throw new Error(`save answered ${res.status}: ${JSON.stringify(res.body)}`);
    acks.push({ vid, version: res.body.version, marker });
    cur = res.body;
  }
}

/** Run the kill-during-saves fault `rounds` times on one data folder. */
export async function killDuringSaves(o: KillOptions): Promise<KillReport> {
  const report: KillReport = { rounds: 0, acknowledged: 0, verified: 0, lost: 0, integrity: [] };
  const acks: Ack[] = [];
  const seq = { n: 0 };
  let vids: number[] = [];
  for (let round = 0; round < o.rounds; round++) {
    const server = await startServer({ dataDir: o.dataDir });
    const s = await new HttpSession(server.url).login(demoUsers.engineer.email, demoUsers.engineer.password);
    if (round === 0) {
      const base = await demoVariantId(s);
      vids = [];
      for (let w = 0; w < o.writers; w++) vids.push(await copyVariant(s, base, `Kill test writer ${w + 1}`));
    }
    const stop = { now: false };
    const running = vids.map((vid) => writer(s, vid, acks, stop, seq));
    await new Promise((r) => setTimeout(r, o.killAfterMs));
    await server.kill();
    stop.now = true;
    await Promise.all(running);
    report.rounds++;
  }
  const server = await startServer({ dataDir: o.dataDir });
  try {
    report.integrity.push(await integrityCheck(path.join(o.dataDir, DB_FILE)));
    const s = await new HttpSession(server.url).login(demoUsers.engineer.email, demoUsers.engineer.password);
    for (const a of acks) {
      const res = await s.request('GET', `/api/variants/${a.vid}/versions/${a.version}`);
      const kept = res.status === 200 ? res.body.model.stack.cooling.top.fluidTemperature : null;
      if (kept === a.marker) report.verified++;
      else report.lost++;
    }
    report.acknowledged = acks.length;
  } finally {
    await server.stop();
  }
  return report;
}
