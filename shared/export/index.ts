/** Import and export formats (pure, isomorphic): CSV writers and readers, model JSON file, SPICE netlist. */
export { toCsv, csvNumber, csvLines, csvDelimiter, cellNumber, CSV_DIGITS, type Cell, type LineIssue } from './csv';
export { MODEL_UNITS, EXPORT_CAUTION, RESULT_CAUTION, sourceLine, type ExportSource } from './units';
export { modelFileObject, modelToJson, readModelFile, readModelObject, MAX_ISSUES, type ImportIssue, type ModelFileHeader, type ModelFileRead } from './modelJson';
export { checkModelReferences } from './modelChecks';
export { matrixCsv, temperaturesCsv, temperatureRows, nodeLabel, TEMPERATURE_COLUMNS, type MatrixKind } from './resultCsv';
export { readFloorplanCsv, idFromName, FLOORPLAN_HEADER, FLOORPLAN_MAX_PARTS, type FloorplanPart, type FloorplanRead } from './floorplanCsv';
export { floorplanToModel, FLOORPLAN_SCENARIO_NAME } from './floorplanModel';
export { FLOORPLAN_DEFAULTS } from './floorplanDefaults';
export { readPowerMapCsv, powerMapToCsv, POWER_MAP_MAX_SIDE, POWER_MAP_NOTE, type PowerMapRead } from './powerMapCsv';
export { compactModel, anchorFoster, type CompactModel, type CompactNode } from './compactModel';
export { writeNetlist, type NetlistOptions } from './netlist';
export { spiceStems, asciiText, commentBlock, spiceNumber } from './spiceNames';
export { UPLOAD_LIMIT_BYTES, matrixQuerySchema, netlistQuerySchema, scenarioQuerySchema, modelImportSchema, floorplanImportSchema, csvPreviewSchema, type FloorplanPreview, type PowerMapPreview } from './requests';
