/**
 * Start Heatloom as a child process on 127.0.0.1 (free port, given data folder) for the load and
 * fault scripts; stop it gracefully (SIGTERM) or kill it hard (SIGKILL to its process group).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';

/** A running server child. */
export interface ServerProcess {
  url: string;
  child: ChildProcess;
  /** What the server printed (stdout + stderr), for error messages. */
  output(): string;
  /** SIGTERM and wait for the exit (graceful shutdown). */
  stop(): Promise<number | null>;
  /** SIGKILL the whole process group at once (a crash). */
  kill(): Promise<void>;
  /** CPU time (user + system, ms) used so far by every process of the server's group, from /proc (Linux). */
  cpuMs(): number;
}

/** Sum of utime + stime (ms) of the processes whose process group is `pgid` (fields 5, 14, 15 of /proc/PID/stat). */
export function groupCpuMs(pgid: number): number {
  const tick = 1000 / 100; // USER_HZ is 100 on Linux (man 5 proc)
  let total = 0;
  for (const pid of fs.readdirSync('/proc').filter((d) => /^\d+$/.test(d))) {
    try {
      const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
      const f = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      if (Number(f[2]) === pgid) total += (Number(f[11]) + Number(f[12])) * tick;
    } catch {
      // the process ended meanwhile
    }
  }
  return total;
}

/** Options of startServer. */
export interface StartOptions {
  dataDir: string;
  env?: Record<string, string>;
  /** Wrap the command, e.g. ['unshare', '-m', 'sh', '-c', '… exec "$0" "$@"']; default none. */
  wrap?: string[];
  /** Milliseconds to wait for /api/health (default 60 000). */
  timeoutMs?: number;
}

/** A free TCP port on the loopback interface. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

/** Spawn `tsx server/index.ts` and wait until it answers GET /api/health; rejects with its output if it exits first. */
export async function startServer(o: StartOptions): Promise<ServerProcess> {
  const port = await freePort();
  const tsx = path.resolve('node_modules/.bin/tsx');
  const cmd = [...(o.wrap ?? []), tsx, 'server/index.ts'];
  const child = spawn(cmd[0], cmd.slice(1), {
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, HOST: '127.0.0.1', PORT: String(port), HEATLOOM_DATA_DIR: o.dataDir, SMTP_FAKE_PORT: '0', LOG_LEVEL: 'warn', ...o.env },
  });
  let out = '';
  child.stdout!.on('data', (d) => { out += d; });
  child.stderr!.on('data', (d) => { out += d; });
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + (o.timeoutMs ?? 60_000);
  let gone = false;
  void exited.then(() => { gone = true; });
  while (!gone) {
    if (Date.now() > deadline) {
      process.kill(-child.pid!, 'SIGKILL');
      throw new Error(`server did not answer within ${o.timeoutMs ?? 60_000} ms:\n${out}`);
    }
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  if (gone) throw Object.assign(new Error(`server exited during start:\n${out}`), { output: out, exitCode: await exited });
  return {
    url, child,
    output: () => out,
    cpuMs: () => groupCpuMs(child.pid!),
    stop: async () => {
      process.kill(child.pid!, 'SIGTERM');
      return exited;
    },
    kill: async () => {
      try { process.kill(-child.pid!, 'SIGKILL'); } catch { /* already gone */ }
      await exited;
    },
  };
}

/** Run the server command expecting it to fail at start; resolves with its exit code and output. */
export async function startExpectingFailure(o: StartOptions): Promise<{ code: number | null; output: string }> {
  try {
    const s = await startServer({ ...o, timeoutMs: o.timeoutMs ?? 60_000 });
    await s.stop();
    return { code: 0, output: s.output() };
  } catch (err) {
    const e = err as Error & { output?: string; exitCode?: number | null };
    return { code: e.exitCode ?? null, output: e.output ?? e.message };
  }
}
