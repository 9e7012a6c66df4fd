/**
 * Input checks of the electro-thermal solve. Truly bad input (wrong sizes, non-finite numbers,
 * negative resistances or coefficients) throws EngineInputError with a field path; physically
 * doubtful input (negative leakage or current, κ above 0.2 /K) is reported as a warning.
 */
import { EngineInputError, type InputIssue } from '../errors';
import type { CoupledProblem } from './solveCoupled';

/** Leakage coefficients above this (1/K) get a warning: common practice is 0.02–0.05 /K. */
export const KAPPA_WARNING_ABOVE = 0.2;

const bad = (v: unknown) => typeof v !== 'number' || !Number.isFinite(v);

/** Check a coupled problem; returns warnings, throws EngineInputError listing every hard problem. */
export function validateCoupledProblem(problem: CoupledProblem): string[] {
  const issues: InputIssue[] = [];
  const warnings: string[] = [];
  const n = problem.laws.length;
  const label = (i: number) => problem.labels?.[i] ?? `node-${i}`;
  if (problem.baseTemperatures.length !== n) issues.push({ path: 'baseTemperatures', message: `expected ${n} base temperatures, got ${problem.baseTemperatures.length}` });
  problem.baseTemperatures.forEach((t, i) => bad(t) && issues.push({ path: `baseTemperatures[${i}]`, message: 'must be a finite temperature in °C' }));
  if (problem.R.length !== n) issues.push({ path: 'R', message: `influence matrix must be ${n}×${n}, got ${problem.R.length} rows` });
  problem.R.forEach((row, j) => {
    if (row.length !== n) issues.push({ path: `R[${j}]`, message: `row must have ${n} entries, got ${row.length}` });
    row.forEach((v, i) => bad(v) && issues.push({ path: `R[${j}][${i}]`, message: 'must be a finite resistance in K/W' }));
    if (!(row[j] >= 0)) issues.push({ path: `R[${j}][${j}]`, message: 'self resistance must not be negative' });
  });
  problem.laws.forEach((law, i) => {
    const at = `laws[${i}]`;
    for (const key of ['dynamic', 'leakageAtRef', 'referenceTemperature', 'kappa', 'current', 'pathResistance20', 'alpha'] as const) {
      const v = law[key];
      if (v !== undefined && bad(v)) issues.push({ path: `${at}.${key}`, message: 'must be a finite number' });
    }
    if (law.dynamic < 0) issues.push({ path: `${at}.dynamic`, message: 'dynamic power must not be negative' });
    if ((law.kappa ?? 0) < 0) issues.push({ path: `${at}.kappa`, message: 'leakage coefficient κ must not be negative' });
    if ((law.pathResistance20 ?? 0) < 0) issues.push({ path: `${at}.pathResistance20`, message: 'path resistance must not be negative' });
    if ((law.alpha ?? 0) < 0) issues.push({ path: `${at}.alpha`, message: 'resistance temperature coefficient must not be negative' });
    if ((law.leakageAtRef ?? 0) < 0) warnings.push(`${label(i)}: leakage at reference is negative (${law.leakageAtRef} W); it lowers the power as it heats up — check the value.`);
    if ((law.current ?? 0) < 0) warnings.push(`${label(i)}: supply current is negative (${law.current} A); Joule heat uses I², so its sign is ignored.`);
    if ((law.kappa ?? 0) > KAPPA_WARNING_ABOVE) warnings.push(`${label(i)}: leakage coefficient κ = ${law.kappa} /K is above ${KAPPA_WARNING_ABOVE} /K (common practice 0.02–0.05 /K); leakage would double every ${(Math.LN2 / (law.kappa ?? 1)).toPrecision(2)} K.`);
  });
  if (issues.length > 0) throw new EngineInputError(issues[0].path, issues[0].message, issues);
  return warnings;
}
