/**
 * Heatloom command line (no server needed). Results go to standard output as JSON (or CSV);
 * diagnostics go to standard error. Under npm use `npm run -s cli -- …` so npm's banner stays out.
 *   channel <request.json>                     solve a flux-channel request (docs/model-format.md)
 *   solve <model.json> [--scenario ID] [--csv] solve an assembly model file
 *   mail --to <address> [--limit N] [--json]   newest mail the local mail server kept for an address
 *                                              (read from HEATLOOM_DATA_DIR's database, ./data by default)
 */
import { readFileSync } from 'node:fs';
import { EngineInputError } from '../shared/engine/errors';
import { solveChannelBody } from '../shared/engine/channelSolve';
import { assemblyCsv } from '../shared/engine/assembly/csv';
import { solveModelDocument } from '../shared/engine/assembly/modelFile';
import { emailSchema } from '../shared/schemas/common';

const USAGE = `usage:
  heatloom channel <request.json>
  heatloom solve <model.json> [--scenario ID] [--csv]
  heatloom mail --to <address> [--limit N] [--json]`;

function readJson(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch {
    throw new CliError(`cannot read ${file}`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new CliError(`${file} is not valid JSON: ${(e as Error).message}`);
  }
}

/** A usage or file problem (exit code 2). */
class CliError extends Error {}

/** `mail --to <address> [--limit N] [--json]`: personal mail (password resets) is in no workspace Outbox; read it here. */
async function mail(args: string[]): Promise<string> {
  let to: string | undefined;
  let limit = 5;
  let json = false;
  for (let i = 0; i < args.length; i++) {
    if (args[i] === '--json') json = true;
    else if (args[i] === '--to' && args[i + 1]) to = args[++i];
    else if (args[i] === '--limit' && /^\d{1,3}$/.test(args[i + 1] ?? '') && Number(args[i + 1]) > 0) limit = Number(args[++i]);
    else throw new CliError(`unknown or incomplete option ${args[i]}\n${USAGE}`);
  }
  const address = emailSchema.safeParse(to ?? '');
  if (!address.success) throw new CliError(`mail needs --to and an e-mail address\n${USAGE}`);
  const { loadConfig } = await import('./config');
  const { readMailTo, mailText } = await import('./api/outbox/personalMail');
  let dataDir: string;
  try {
    dataDir = loadConfig().dataDir;
  } catch (e) {
    throw new CliError((e as Error).message);
  }
  const messages = await readMailTo(dataDir, address.data, limit);
  if (!messages) throw new CliError(`no Heatloom database in ${dataDir} (set HEATLOOM_DATA_DIR)`);
  return json ? JSON.stringify(messages) : mailText(address.data, messages);
}

async function run(argv: string[]): Promise<string> {
  const [command, file, ...rest] = argv;
  if (!command || command === '--help' || command === '-h') throw new CliError(USAGE);
  if (command === 'mail') return mail(argv.slice(1));
  if (!file) throw new CliError(`missing file\n${USAGE}`);
  if (command === 'channel') return JSON.stringify(solveChannelBody(readJson(file)));
  if (command === 'solve') {
    let scenario: string | undefined;
    let csv = false;
    for (let i = 0; i < rest.length; i++) {
      if (rest[i] === '--csv') csv = true;
      else if (rest[i] === '--scenario' && rest[i + 1]) scenario = rest[++i];
      else throw new CliError(`unknown option ${rest[i]}\n${USAGE}`);
    }
    const result = solveModelDocument(readJson(file), scenario);
    return csv ? assemblyCsv(result) : JSON.stringify(result);
  }
  throw new CliError(`unknown command ${command}\n${USAGE}`);
}

try {
  process.stdout.write((await run(process.argv.slice(2))) + '\n');
} catch (e) {
  if (e instanceof EngineInputError) {
    process.stderr.write(`input error at ${e.path || '(top)'}: ${e.message}\n`);
    for (const issue of e.issues.slice(1)) process.stderr.write(`  also: ${issue.message}\n`);
    process.exitCode = 2;
  } else if (e instanceof CliError) {
    process.stderr.write(`${e.message}\n`);
    process.exitCode = 2;
  } else {
    process.stderr.write(`internal error: ${(e as Error).stack ?? String(e)}\n`);
    process.exitCode = 1;
  }
}
