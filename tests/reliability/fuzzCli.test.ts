/**
 * Property-based bad input for the command line: the documents it reads go through
 * solveModelDocument / solveChannelRequest, which must answer hostile documents with an
 * EngineInputError (the CLI's exit code 2 and one readable line), never another error (exit 1,
 * "internal error" with a stack). A few real CLI runs check the exit code and the wording.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { EngineInputError } from '../../shared/engine/errors';
import { solveModelDocument } from '../../shared/engine/assembly/modelFile';
import { solveChannelRequest } from '../../shared/engine/channelRequest';
import { demoContent } from '../../server/db/seeders/demoContent';
import { hostileValue, mutated } from './hostile';

const SEED = 8_2026;
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-cli-fuzz-'));
afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

const model = demoContent().variants[2].model;
const channel = {
  footprint: { x: 0.01, y: 0.01 },
  above: { layers: [{ thickness: 5e-4, k: 150 }], h: 5000 },
  below: { layers: [], h: 0 },
  sources: [{ x: 0.005, y: 0.005, width: 0.002, height: 0.002, power: 1 }],
};

/** Parse like the CLI (broken JSON is the CLI's own usage error) and solve; returns 'ok', 'input' or the unexpected error. */
function outcome(text: string, solve: (doc: unknown) => unknown): string {
  let doc: unknown;
  try { doc = JSON.parse(text); } catch { return 'input'; }
  try {
    solve(doc);
    return 'ok';
  } catch (e) {
    return e instanceof EngineInputError ? 'input' : `unexpected ${(e as Error).name}: ${(e as Error).message}`;
  }
}

describe('CLI documents', () => {
  it('model files: hostile values anywhere give an input error or a valid solve', () => {
    fc.assert(
      fc.property(fc.oneof({ weight: 4, arbitrary: mutated(model) }, { weight: 1, arbitrary: hostileValue }), (text) => {
        const o = outcome(text, (d) => solveModelDocument(d));
        expect(o === 'ok' || o === 'input', `${o} ← ${text.slice(0, 200)}`).toBe(true);
      }),
      { numRuns: 40, seed: SEED },
    );
  }, 240_000);

  it('channel requests: hostile values anywhere give an input error or a valid solve', () => {
    fc.assert(
      fc.property(fc.oneof({ weight: 4, arbitrary: mutated(channel) }, { weight: 1, arbitrary: hostileValue }), (text) => {
        const o = outcome(text, (d) => solveChannelRequest(d));
        expect(o === 'ok' || o === 'input', `${o} ← ${text.slice(0, 200)}`).toBe(true);
      }),
      { numRuns: 60, seed: SEED + 1 },
    );
  }, 120_000);

  it('the CLI itself answers exit code 2 and one readable line, no stack trace', () => {
    const cases = { 'broken.json': '{"stack": NaN', 'proto.json': '{"__proto__":{"polluted":1},"parts":"x"}', 'deep.json': '['.repeat(5000) + ']'.repeat(5000) };
    for (const [name, text] of Object.entries(cases)) {
      const file = path.join(tmp, name);
      fs.writeFileSync(file, text);
      const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli.ts', 'solve', file], { encoding: 'utf8', timeout: 60_000 });
      expect(r.status, `${name}: ${r.stderr}`).toBe(2);
      expect(r.stderr).not.toMatch(/\n\s+at /);
      expect(r.stdout).toBe('');
    }
  }, 180_000);
});
