/** Formats load figures as a Markdown table and writes them into the "Load" section of docs/performance.md. */
import fs from 'node:fs';
import os from 'node:os';
import type { PhaseFigures } from './loadPhase';

const START = '<!-- load:start (written by npm run load) -->';
const END = '<!-- load:end -->';

/** Health-route latency measured beside a phase (shows whether the event loop stayed free). */
export interface ProbeFigures {
  phase: string;
  p95: number;
  max: number;
  count: number;
}

const ms = (x: number) => (Number.isFinite(x) ? x.toFixed(0) : '–');

/** The Markdown table of the phases. */
export function phaseTable(rows: PhaseFigures[]): string {
  const head = '| phase | clients | requests | req/s | p50 ms | p95 ms | p99 ms | server CPU ms/req | errors | statuses |\n|---|---:|---:|---:|---:|---:|---:|---:|---:|---|';
  const body = rows.map((r) => `| ${r.name} | ${r.clients} | ${r.requests} | ${r.rps.toFixed(1)} | ${ms(r.p50)} | ${ms(r.p95)} | ${ms(r.p99)} | ${r.cpuPerRequest.toFixed(1)} | ${r.errors} | ${Object.entries(r.statuses).map(([s, n]) => `${s}×${n}`).join(' ')} |`);
  return [head, ...body].join('\n');
}

/** Replace (or append) the generated block of the Load section in `file`. */
export function writeLoadSection(file: string, rows: PhaseFigures[], probes: ProbeFigures[], notes: string[]): void {
  const when = new Date().toISOString().replace(/\.\d+Z$/, 'Z');
  const load = os.loadavg().map((x) => x.toFixed(1)).join(' / ');
  const block = [
    START,
    `Measured ${when} on ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'cpu'}), Node ${process.version}; load average at the end ${load} (1/5/15 min).`,
    '',
    phaseTable(rows),
    '',
    'Health route (`GET /api/health`) polled every 100 ms during the uncached solve phases — the event loop stays free while the engine works on worker threads:',
    '',
    '| during | polls | p95 ms | max ms |\n|---|---:|---:|---:|',
    ...probes.map((p) => `| ${p.phase} | ${p.count} | ${ms(p.p95)} | ${ms(p.max)} |`),
    '',
    ...notes.map((n) => `- ${n}`),
    END,
  ].join('\n');
  let text = fs.existsSync(file) ? fs.readFileSync(file, 'utf8') : '';
  const a = text.indexOf(START);
  const b = text.indexOf(END);
  if (a >= 0 && b > a) text = text.slice(0, a) + block + text.slice(b + END.length);
  else text = `${text.replace(/\s*$/, '')}\n\n## Load\n\nFigures below are written by \`npm run load\` (scripts/load.ts); see docs/reliability.md for how the run is built.\n\n${block}\n`;
  fs.writeFileSync(file, text);
}
