/**
 * `npm run restore -- <backup.sqlite> [--data DIR]`: stop the app first, then this checks the
 * backup (integrity_check), keeps the current database as DIR/backups/before-restore-<time>.sqlite,
 * writes the backup into DIR/heatloom.sqlite through SQLite's backup API and checks the result.
 * Start the app again afterwards. See docs/reliability.md.
 */
import fs from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { backupDatabase, DB_FILE, fileStamp, integrityCheck, restoreDatabase } from './reliability/sqliteFiles';

async function main(): Promise<void> {
  const { values, positionals } = parseArgs({ options: { data: { type: 'string' } }, allowPositionals: true });
  const source = positionals[0];
  if (!source) throw new Error('usage: npm run restore -- <backup.sqlite> [--data DIR]');
  const dataDir = path.resolve(values.data ?? process.env.HEATLOOM_DATA_DIR ?? './data');
  const target = path.join(dataDir, DB_FILE);
  const checkSource = await integrityCheck(path.resolve(source));
  if (checkSource !== 'ok') throw new Error(`${source} failed its integrity check (${checkSource}); nothing was changed`);
  if (fs.existsSync(target)) {
    const kept = path.join(dataDir, 'backups', `before-restore-${fileStamp()}.sqlite`);
    await backupDatabase(target, kept);
    process.stdout.write(`Current database kept as ${kept}\n`);
  }
  await restoreDatabase(path.resolve(source), target);
  const check = await integrityCheck(target);
  if (check !== 'ok') throw new Error(`the restored database failed its integrity check: ${check}`);
  process.stdout.write(`Restored ${source} into ${target} (integrity check: ok). Start the app again.\n`);
}

main().catch((err: Error) => {
  process.stderr.write(`Restore failed: ${err.message}\n`);
  process.exit(1);
});
