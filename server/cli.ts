/**
 * Heatloom command line (no server needed). Results go to standard output as JSON (or CSV);
 * diagnostics go to standard error. Under npm use `npm run -s cli -- …` so npm's banner stays out.
 *   channel <request.json>                     solve a flux-channel request (docs/model-format.md)
 *   solve <model.json> [--scenario ID] [--csv] solve an assembly model file
 */
import { readFileSync } from 'node:fs';
import { EngineInputError } from '../shared/engine/errors';
import { solveChannelBody } from '../shared/engine/channelSolve';
import { assemblyCsv } from '../shared/engine/assembly/csv';
import { solveModelDocument } from '../shared/engine/assembly/modelFile';

const USAGE = `usage:
  heatloom channel <request.json>
  heatloom solve <model.json> [--scenario ID] [--csv]`;

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

function run(argv: string[]): string {
  const [command, file, ...rest] = argv;
  if (!command || command === '--help' || command === '-h') throw new CliError(USAGE);
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
  process.stdout.write(run(process.argv.slice(2)) + '\n');
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
