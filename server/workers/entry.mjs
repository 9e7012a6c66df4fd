/**
 * Piscina worker entry (plain JavaScript so Node can load it in a fresh thread): registers tsx in
 * a private namespace with the project's tsconfig (for the @shared/* alias), then loads the
 * TypeScript task handler. Works the same under `tsx server/index.ts` and under vitest.
 */
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

const tsconfig = fileURLToPath(new URL('../../tsconfig.json', import.meta.url));
const api = register({ namespace: 'heatloom-engine-worker', tsconfig });
const tasks = await api.import('./engineTasks.ts', import.meta.url);

/** The handler piscina calls with each task. */
export default tasks.default ?? tasks.runTask;
