// The chemistry core: pure TypeScript over openchemlib, no framework imports.

export { StructureError, isStructureError, type StructureErrorCode } from './errors';
export { detectFormat, MAX_STRUCTURE_BYTES, type StructureFormat } from './format';
export { readStructure, readStructures, type ParsedStructure, type ReadOptions } from './parse';
export { splitSdf, type SdfRecord } from './sdf';
export { formulaOf, molarMassOf, canonicalForm, type CanonicalForm } from './properties';
export { depictSvg, type DepictOptions } from './depict';
export { highlightAtoms } from './highlight';
export {
	perceive,
	findGroups,
	findProtectingGroups,
	type Perception,
	type GroupInstance,
	type ProtectingGroupInstance
} from './perceive';
export { perceiveText, perceiveWithKey, clearPerceptionCache } from './perception-cache';
export {
	perceptionRules,
	compileRules,
	groupPatternSchema,
	protectingGroupPatternSchema,
	RuleTableError,
	type GroupPattern,
	type ProtectingGroupPattern,
	type PerceptionRules
} from './patterns';
export { analyzeStructure, type Analysis, type AnalyzeOptions } from './analyze';
