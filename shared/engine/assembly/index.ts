/** The assembly model (physics.md §2): network of two spreading planes and part columns. */
export { solveAssembly, ASSEMBLY_MAP_SIZE, type AssemblyOptions } from './solve';
export { solveModelDocument } from './modelFile';
export { assemblyNetwork, solveNetwork, type AssemblyNetwork, type NetworkOptions, type NetworkState, type Plane } from './network';
export { findScenario, loadOf, nodePowers, partPowers } from './loads';
export { partGeometries, rotatedSize, lidOrigin, lidChannel, interposerChannel, type PartGeometry } from './geometry';
export { columnOf, type Column, type ColumnNode } from './columns';
export { planeMaps, planeMap, sampleMap, type PlacedMap } from './planeMaps';
export { hotSpots, type HotSpot } from './hotspot';
export { assemblyCsv } from './csv';
export { IDEALISATIONS } from './idealisations';
export type { AssemblyResult, PartResult, MapResult } from './result';
