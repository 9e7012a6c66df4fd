/** Transient thermal behaviour: Laplace inversion, Foster networks, profiles and timing (physics.md §3). */
export { stehfestAbscissae, stehfestCombine, stehfestInvert, stehfestWeights, STEHFEST_TERMS } from './stehfest';
export { talbotInvert, TALBOT_NODES, type Complex } from './talbot';
export { leastSquares, qrFactor, qrSolve, type QrFactors } from './leastSquares';
export { nnls, type NnlsResult } from './nnls';
export { fitFoster, fosterStep, logSpacedTaus, signedFosterDesign, FOSTER_FIT_DEFAULTS, type FosterDesign, type FosterFit, type FosterFitSettings } from './fosterFit';
export {
  fitFosterNetwork,
  networkStep,
  selectRows,
  FOSTER_NETWORK_DEFAULTS,
  type FosterNetwork,
  type FosterNetworkFit,
  type FosterNetworkSettings,
  type ImpedanceSeries,
} from './fosterNetwork';
export { MAX_PROFILE_STEPS, scheduleFromSegments, scheduleFromTable, type PowerSchedule, type PowerTable } from './schedule';
export { simulateProfile, type SimulationOptions, type SimulationResult, type SimulationStart } from './simulateProfile';
export { packNetwork, steadyState, stateTemperatures, temperatureAfter, type PackedNetwork } from './fosterState';
export { firstCrossing, stateAfter, type Crossing } from './crossing';
export { cycleMaxima, largestOnTime, periodicStartState } from './periodic';
export { timingAnswers, type TimingAnswers, type TimingRequest } from './timingAnswers';
export { formatCelsius, formatDuration, formatPercent, formatWatts } from './sentences';
export { checkCancelled, TransientCancelledError, type LongRunHooks } from './progress';
export { buildPlaneKernel, planeMatrixAt, KERNEL_POINTS_PER_DECADE, type PlaneKernel } from './planeKernel';
export { assemblyResponseAt, prepareLaplaceAssembly, LAPLACE_DEFAULTS, type LaplaceAssembly, type LaplaceSettings } from './laplaceAssembly';
export { assemblyImpedance, impedanceTimes, nodeLabel, validateTimes, IMPEDANCE_DEFAULTS, MAX_IMPEDANCE_TIMES, type AssemblyImpedance, type ImpedanceOptions } from './assemblyImpedance';
export { assemblySources, type ImpedanceSource } from './impedanceSources';
export { impedanceChecks, type ImpedanceChecks } from './impedanceChecks';
export { channelImpedance, requireHeatCapacity, solveChannelTransient, type ChannelImpedance } from './channelImpedance';
export {
  modelTimingAnswers,
  prepareModelTransient,
  scenarioSchedule,
  scenarioSourcePowers,
  scenarioTimeline,
  sourceLaws,
  type ModelTransient,
  type PartTimingRequest,
  type TimelineOptions,
} from './modelTransient';
