/** Fault: two engineers save the same variant from the same version; the second gets 409 and re-applies, nothing is lost. */
import { demoUsers } from '../../server/db/seeders/demoUsers';
import { HttpSession } from './httpSession';
import { copyVariant, demoVariantId } from './demoData';
import { startServer } from './serverProcess';

/** What the run found. */
export interface ConflictReport {
  firstSave: number;
  secondSave: number;
  conflictCode: string | null;
  reappliedSave: number;
  bothChangesKept: boolean;
  lost: number;
}

/** Run the scenario on a fresh server in `dataDir`. */
export async function conflictingSaves(dataDir: string): Promise<ConflictReport> {
  const server = await startServer({ dataDir });
  try {
    const emil = await new HttpSession(server.url).login(demoUsers.engineer.email, demoUsers.engineer.password);
    const ada = await new HttpSession(server.url).login(demoUsers.owner.email, demoUsers.owner.password);
    const vid = await copyVariant(ada, await demoVariantId(ada), 'Conflict test');
    const mine = (await emil.request('GET', `/api/variants/${vid}`)).body;
    const theirs = (await ada.request('GET', `/api/variants/${vid}`)).body;
    mine.model.stack.cooling.top.h *= 1.5;
    theirs.model.stack.cooling.top.fluidTemperature = 31;
    const first = await emil.request('PUT', `/api/variants/${vid}`, { model: mine.model, version: mine.version });
    const second = await ada.request('PUT', `/api/variants/${vid}`, { model: theirs.model, version: theirs.version });
    const current = second.body?.error?.details?.current ?? (await ada.request('GET', `/api/variants/${vid}`)).body;
    current.model.stack.cooling.top.fluidTemperature = 31;
    const again = await ada.request('PUT', `/api/variants/${vid}`, { model: current.model, version: current.version });
    const final = (await ada.request('GET', `/api/variants/${vid}`)).body;
    const kept = final.model.stack.cooling.top.h === mine.model.stack.cooling.top.h && final.model.stack.cooling.top.fluidTemperature === 31;
    const firstKept = (await ada.request('GET', `/api/variants/${vid}/versions/${first.body.version}`)).body.model.stack.cooling.top.h === mine.model.stack.cooling.top.h;
    return {
      firstSave: first.status, secondSave: second.status, conflictCode: second.body?.error?.code ?? null, reappliedSave: again.status,
      bothChangesKept: kept && firstKept, lost: kept && firstKept ? 0 : 1,
    };
  } finally {
    await server.stop();
  }
}
