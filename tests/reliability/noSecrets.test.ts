/** No secret in the repository: no private keys, no session secret values, no tracked data folder, .env or session-secret file. */
import fs from 'node:fs';
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

const patterns: [string, RegExp][] = [
  ['private key', /-----BEGIN [A-Z ]*PRIVATE KEY-----/],
  ['session secret value', /SESSION_SECRET\s*[=:]\s*['"]?[A-Za-z0-9+/_-]{16,}/],
  ['AWS-style access key', /AKIA[0-9A-Z]{16}/],
];

/** A line holding a value marked as a throw-away test value (e.g. the browser tests' own server) is not a secret. */
const THROWAWAY = /not-for-production/;

describe('repository', () => {
  it('tracks no secret files and no secret values', () => {
    const files = execFileSync('git', ['ls-files'], { encoding: 'utf8' }).split('\n').filter(Boolean);
    expect(files.filter((f) => /(^|\/)(\.env|session-secret)$|^data\//.test(f))).toEqual([]);
    const hits: string[] = [];
    for (const file of files) {
      if (!fs.existsSync(file) || fs.statSync(file).size > 1_000_000 || /\.(png|jpe?g|woff2?|ico|sqlite)$/.test(file)) continue;
      const text = fs.readFileSync(file, 'utf8');
      const lines = text.split('\n').filter((l) => !THROWAWAY.test(l));
      for (const [what, re] of patterns) if (lines.some((l) => re.test(l))) hits.push(`${file}: ${what}`);
    }
    expect(hits).toEqual([]);
  });
});
