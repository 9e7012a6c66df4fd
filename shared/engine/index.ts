/** Heatloom's thermal engine: flux channel (physics.md §1), assembly (§2); pure TypeScript, SI units. */
export { channelInfluence, channelModes, meanRises, toRows, type ChannelInfluence, type ChannelModes, type ChannelOptions } from './channel';
export { solveChannelRequest, toChannel } from './channelRequest';
export { solveChannelBody } from './channelSolve';
export { EngineInputError, formatPath, type InputIssue } from './errors';
export { ImpedanceCache, defaultImpedanceCache, channelKey } from './cache';
export { CHANNEL_DEFAULTS } from './options';
export { compileStack, stackImpedance, parallelImpedance, weightedImpedanceTable, uniformModeImpedances } from './impedance';
export { influenceFromSpectra, selfInfluenceFromSpectra, richardson, type ModalTable, type Spectra } from './influence';
export { modalTemperatures, fieldMap, pointValue, sigmaFactors, type FieldMap } from './field';
export { peaksOverRects, type ModalField } from './peak';
export { autoTruncation, buildSpectra, checkTruncation, splitBySize, SMALL_SOURCE_FRACTION, type TruncationReport } from './truncation';
export { luFactor, luSolve, type LuFactors } from './linear';
export type { Channel, ChannelLayer, ChannelStack, RectSource, Truncation } from './types';
export * from './assembly';
export * from './transient';
export * from './electrothermal';
