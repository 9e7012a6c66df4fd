/**
 * `npm run backup -- [--data DIR] [--out FILE]`: a consistent copy of Heatloom's database while
 * the app runs (SQLite online backup API), checked with PRAGMA integrity_check. Defaults: DIR is
 * $HEATLOOM_DATA_DIR or ./data; FILE is DIR/backups/heatloom-<UTC time>.sqlite. See docs/reliability.md.
 */
import path from 'node:path';
import { parseArgs } from 'node:util';
import { backupDatabase, DB_FILE, fileStamp, integrityCheck } from './reliability/sqliteFiles';

async function main(): Promise<void> {
  const { values } = parseArgs({ options: { data: { type: 'string' }, out: { type: 'string' } } });
  const dataDir = path.resolve(values.data ?? process.env.HEATLOOM_DATA_DIR ?? './data');
  const out = path.resolve(values.out ?? path.join(dataDir, 'backups', `heatloom-${fileStamp()}.sqlite`));
  await backupDatabase(path.join(dataDir, DB_FILE), out);
  const check = await integrityCheck(out);
  if (check !== 'ok') throw new Error(`the copy failed its integrity check: ${check}`);
  process.stdout.write(`Backup written to ${out} (integrity check: ok)\n`);
}

main().catch((err: Error) => {
  process.stderr.write(`Backup failed: ${err.message}\n`);
  process.exit(1);
});
