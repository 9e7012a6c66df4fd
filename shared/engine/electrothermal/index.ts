/** Electro-thermal coupling: leakage and Joule feedback, runaway and margins (physics.md §4). */
export { analyseCoupling, type CouplingOptions, type CouplingResult, type PowerParts } from './analyseCoupling';
export { ambientMargin, powerScaleMargin, MARGIN_DEFAULTS, type Margin, type MarginSettings } from './margins';
export { loopGain, isLoopStable, type LoopGain } from './loopGain';
export { evaluatePower, nominalPower, POWER_LAW_DEFAULTS, type NodePowerLaw, type PowerSplit } from './powerLaw';
export { solveCoupled, COUPLED_DEFAULTS, type CoupledProblem, type CoupledSettings, type CoupledSolve } from './solveCoupled';
export { validateCoupledProblem, KAPPA_WARNING_ABOVE } from './validateCoupling';
export { analyseModelCoupling, coupledProblemFromModel } from './fromModel';
