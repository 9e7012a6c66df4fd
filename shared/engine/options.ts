/** Documented defaults of the flux-channel engine (one place). */
export const CHANNEL_DEFAULTS = {
  /** Relative change of the largest influence entry that ends the truncation doubling (physics.md §1). */
  tolerance: 3e-5,
  /** Starting modes per axis ≈ startFactor · L / (smallest source side). */
  startFactor: 20,
  /** Fewest modes per axis. */
  minModes: 8,
  /** Cap on M·N (modes kept): requests above it are refused; automatic doubling stops there. */
  maxModes: 1_048_576,
  /** Cap on the pair-sum work M·N·(sources)(sources+1)/2 of one influence matrix. */
  maxWork: 4e9,
  /** Most doublings tried by the automatic truncation. */
  maxDoublings: 10,
  /** Laplace variable (1/s); 0 is the steady state. */
  s: 0,
} as const;
