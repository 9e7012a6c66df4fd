/**
 * Piecewise-constant power schedules (physics.md §3): per-part segments (steady levels, pulse
 * trains) or a time/power table (e.g. parsed from CSV) merged onto one set of intervals.
 * Caps keep a profile sane; bad input throws EngineInputError with a field path.
 */
import type { Segment } from '../../schemas/model';
import { EngineInputError } from '../errors';

/** Most intervals a simulated profile may have. */
export const MAX_PROFILE_STEPS = 100_000;

/** Power of every source over intervals [bounds[q], bounds[q+1]) (s); power[q][i] in W. */
export interface PowerSchedule {
  bounds: number[];
  power: number[][];
}

/** A table form of a profile: from times[r] on, source i dissipates power[r][i] W. */
export interface PowerTable {
  times: number[];
  power: number[][];
  /** End of the profile (s); default the last time, whose row then only closes the profile. */
  end?: number;
}

const fail = (path: string, message: string): never => {
  throw new EngineInputError(path, message);
};

/** Check a table and turn it into a schedule of `sources` columns. */
export function scheduleFromTable(table: PowerTable, sources: number, maxSteps = MAX_PROFILE_STEPS): PowerSchedule {
  const { times, power } = table;
  if (times.length === 0) fail('times', 'A profile table needs at least one row.');
  if (power.length !== times.length) fail('power', `Expected ${times.length} rows of power, got ${power.length}.`);
  if (times[0] !== 0) fail('times[0]', 'A profile table must start at time 0 s.');
  times.forEach((t, r) => {
    if (!Number.isFinite(t)) fail(`times[${r}]`, 'Times must be finite numbers of seconds.');
    if (r > 0 && !(t > times[r - 1])) fail(`times[${r}]`, `Times must increase: ${t} s follows ${times[r - 1]} s.`);
  });
  power.forEach((row, r) => {
    if (row.length !== sources) fail(`power[${r}]`, `Expected ${sources} powers (one per part), got ${row.length}.`);
    row.forEach((p, i) => (Number.isFinite(p) && p >= 0) || fail(`power[${r}][${i}]`, 'Powers must be finite numbers ≥ 0 W.'));
  });
  const end = table.end ?? times[times.length - 1];
  if (!(end > 0) || end < times[times.length - 1]) fail('end', 'The profile end must be after the last time and greater than 0 s.');
  const rows = end > times[times.length - 1] ? times.length : times.length - 1;
  if (rows > maxSteps) fail('times', `The profile has ${rows} steps, above the cap of ${maxSteps}.`);
  const bounds = [...times.slice(0, rows), end];
  return { bounds, power: power.slice(0, rows).map((row) => [...row]) };
}

/** Intervals (end times, levels) of one part's segments; counts steps before expanding. */
function expandSegments(segments: readonly Segment[], path: string, maxSteps: number): { ends: number[]; levels: number[] } {
  const count = segments.reduce((c, s) => c + (s.kind === 'steady' ? 1 : 2 * s.repeats), 0);
  if (count > maxSteps) fail(path, `This profile has ${count} steps, above the cap of ${maxSteps}; use fewer repeats or segments.`);
  const ends: number[] = [];
  const levels: number[] = [];
  let t = 0;
  segments.forEach((s, k) => {
    const durations = s.kind === 'steady' ? [s.duration] : [s.onTime, s.offTime];
    if (!durations.every((d) => Number.isFinite(d) && d > 0)) fail(`${path}[${k}]`, 'Durations must be finite numbers greater than 0 s.');
    const powers = s.kind === 'steady' ? [s.power] : [s.onPower, s.offPower];
    if (!powers.every((p) => Number.isFinite(p) && p >= 0)) fail(`${path}[${k}]`, 'Powers must be finite numbers ≥ 0 W.');
    const repeats = s.kind === 'steady' ? 1 : s.repeats;
    for (let r = 0; r < repeats; r++) {
      for (let q = 0; q < durations.length; q++) {
        t += durations[q];
        ends.push(t);
        levels.push(powers[q]);
      }
    }
  });
  return { ends, levels };
}

/**
 * Merge per-source segments into one schedule. Sources without segments keep basePower[i];
 * a source whose segments end early holds its last level. The profile lasts as long as the
 * longest list of segments.
 */
export function scheduleFromSegments(
  segments: readonly (readonly Segment[] | undefined)[],
  basePower: readonly number[],
  maxSteps = MAX_PROFILE_STEPS,
): PowerSchedule {
  const parts = segments.map((s, i) => (s && s.length > 0 ? expandSegments(s, `profile.parts[${i}]`, maxSteps) : { ends: [], levels: [] }));
  const end = Math.max(0, ...parts.map((p) => (p.ends.length ? p.ends[p.ends.length - 1] : 0)));
  if (!(end > 0)) fail('profile.parts', 'The profile has no segments.');
  const all = new Float64Array(parts.reduce((c, p) => c + p.ends.length, 0));
  let at = 0;
  for (const p of parts) for (const e of p.ends) all[at++] = e;
  all.sort();
  const gap = 1e-12 * end;
  const bounds = [0];
  for (const e of all) if (e - bounds[bounds.length - 1] > gap) bounds.push(e);
  if (end - bounds[bounds.length - 1] > gap) bounds.push(end);
  bounds[bounds.length - 1] = end;
  if (bounds.length - 1 > maxSteps) fail('profile.parts', `The merged profile has ${bounds.length - 1} steps, above the cap of ${maxSteps}.`);
  const cursor = parts.map(() => 0);
  const power = bounds.slice(1).map((b) =>
    parts.map((p, i) => {
      if (p.ends.length === 0) return basePower[i] ?? 0;
      while (cursor[i] < p.ends.length - 1 && p.ends[cursor[i]] < b - gap) cursor[i]++;
      return p.levels[cursor[i]];
    }),
  );
  return { bounds, power };
}
