/** The session secret: from the environment, or generated once and kept in the data folder. */
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';

/** Return `configured` if given, else read `<dataDir>/session-secret` (creating it with 0600 permissions). */
export function resolveSessionSecret(dataDir: string, configured?: string): string {
  if (configured) return configured;
  const file = path.join(dataDir, 'session-secret');
  if (fs.existsSync(file)) {
    const kept = fs.readFileSync(file, 'utf8').trim();
    if (kept.length >= 32) return kept;
  }
  const secret = crypto.randomBytes(48).toString('base64url');
  fs.mkdirSync(dataDir, { recursive: true });
  fs.writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}
