/**
 * `npm run bench`: runs every case exported as `benchCases` by the files in scripts/bench/ and prints one
 * table per section: median and best wall time (ms), CPU time per run (ms), and the process's peak
 * resident memory so far (MB, process.resourceUsage().maxRSS). Add a file there to add a section.
 */
import { readdirSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { BenchCase } from './bench/types';

const dir = join(fileURLToPath(new URL('.', import.meta.url)), 'bench');

interface Row {
  name: string;
  median: number;
  best: number;
  cpu: number;
  rssMb: number;
}

function measure(c: BenchCase): Row {
  for (let i = 0; i < (c.warmup ?? 2); i++) c.run();
  const times: number[] = [];
  const cpu0 = process.cpuUsage();
  const repeat = c.repeat ?? 7;
  for (let i = 0; i < repeat; i++) {
    const t0 = performance.now();
    c.run();
    times.push(performance.now() - t0);
  }
  const cpu = process.cpuUsage(cpu0);
  times.sort((a, b) => a - b);
  return {
    name: c.name,
    median: times[Math.floor(times.length / 2)],
    best: times[0],
    cpu: (cpu.user + cpu.system) / 1000 / repeat,
    rssMb: process.resourceUsage().maxRSS / 1024,
  };
}

async function main(): Promise<void> {
  const files = readdirSync(dir).filter((f) => f.endsWith('.ts') && !f.endsWith('.d.ts')).sort();
  const cases: BenchCase[] = [];
  for (const f of files) {
    const mod = (await import(pathToFileURL(join(dir, f)).href)) as { benchCases?: BenchCase[] };
    if (mod.benchCases) cases.push(...mod.benchCases);
  }
  const filter = process.argv[2];
  console.log(`node ${process.version}, ${cpus().length} CPU (${cpus()[0]?.model ?? '?'}), load average ${loadavg().map((v) => v.toFixed(1)).join(' ')}`);
  const sections = [...new Set(cases.map((c) => c.section))];
  for (const section of sections) {
    const rows = cases.filter((c) => c.section === section && (!filter || c.name.includes(filter) || section.includes(filter))).map(measure);
    if (rows.length === 0) continue;
    console.log(`\n## ${section}\n`);
    console.log('| case | median ms | best ms | CPU ms/run | peak RSS MB |');
    console.log('|---|---:|---:|---:|---:|');
    for (const r of rows) console.log(`| ${r.name} | ${r.median.toFixed(1)} | ${r.best.toFixed(1)} | ${r.cpu.toFixed(1)} | ${r.rssMb.toFixed(0)} |`);
  }
}

void main();
