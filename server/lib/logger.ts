/** Minimal levelled logger writing one line per event to stdout/stderr. */
const order = { debug: 10, info: 20, warn: 30, error: 40, silent: 100 } as const;
/** Logger level names. */
export type LogLevel = keyof typeof order;

/** A small logger: info/warn/error/debug with optional structured detail. */
export interface Logger {
  debug(msg: string, detail?: unknown): void;
  info(msg: string, detail?: unknown): void;
  warn(msg: string, detail?: unknown): void;
  error(msg: string, detail?: unknown): void;
}

/** Create a logger that drops messages below `level`. */
export function createLogger(level: LogLevel): Logger {
  const emit = (lvl: Exclude<LogLevel, 'silent'>, msg: string, detail?: unknown): void => {
    if (order[lvl] < order[level]) return;
    const extra = detail === undefined ? '' : ` ${detail instanceof Error ? detail.stack ?? detail.message : JSON.stringify(detail)}`;
    const line = `${new Date().toISOString()} ${lvl.toUpperCase()} ${msg}${extra}`;
    if (lvl === 'error' || lvl === 'warn') process.stderr.write(`${line}\n`);
    else process.stdout.write(`${line}\n`);
  };
  return {
    debug: (m, d) => emit('debug', m, d),
    info: (m, d) => emit('info', m, d),
    warn: (m, d) => emit('warn', m, d),
    error: (m, d) => emit('error', m, d),
  };
}
