/** A benchmark case: colleagues add a file in scripts/bench/ exporting `benchCases: BenchCase[]`. */
export interface BenchCase {
  /** Table the case belongs to (one table per section). */
  section: string;
  name: string;
  /** Optional size column (e.g. number of parts). */
  size?: number;
  /** One timed run; return nothing. Set-up belongs outside `run`. */
  run: () => void;
  /** Timed repetitions (default 7) after `warmup` untimed ones (default 2). */
  repeat?: number;
  warmup?: number;
}
