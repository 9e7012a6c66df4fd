/** Transient thermal behaviour: Laplace inversion, Foster networks, profiles and timing (physics.md §3). */
export { stehfestAbscissae, stehfestCombine, stehfestInvert, stehfestWeights, STEHFEST_TERMS } from './stehfest';
export { talbotInvert, TALBOT_NODES, type Complex } from './talbot';
export { leastSquares } from './leastSquares';
export { nnls, type NnlsResult } from './nnls';
export { fitFoster, fosterStep, logSpacedTaus, FOSTER_FIT_DEFAULTS, type FosterFit, type FosterFitSettings } from './fosterFit';
export {
  fitFosterNetwork,
  networkStep,
  FOSTER_NETWORK_DEFAULTS,
  type FosterNetwork,
  type FosterNetworkFit,
  type FosterNetworkSettings,
  type ImpedanceSeries,
} from './fosterNetwork';
