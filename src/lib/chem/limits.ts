// Every size limit on structures, in one place: the parser, the API, route saves and imports,
// the README and the tests all read them from here. They are checked on the text, before
// openchemlib allocates anything (a molfile that declares 99,999,999 atoms would make it try).

/**
 * Limits on one structure and on a route, e.g. `STRUCTURE_LIMITS.maxHeavyAtoms` → 300.
 * Protecting-group work rarely passes 150 heavy atoms (a protected hexapeptide or a macrolide
 * with its silyl ethers is 80–150); 300 leaves room and keeps one analysis near 0.2 s.
 */
export const STRUCTURE_LIMITS = {
	/** UTF-8 bytes of one structure's text (a SMILES, a molfile or one SDF record). */
	maxTextBytes: 1024 * 1024,
	/** Atoms of one structure, explicit hydrogens included, as declared and as found. */
	maxAtoms: 1000,
	/** Bonds of one structure, as declared and as found. */
	maxBonds: 1200,
	/** Non-hydrogen atoms of one structure. */
	maxHeavyAtoms: 300,
	/** Non-hydrogen atoms up to which a drawing is made; larger structures are analysed undrawn. */
	maxDrawingHeavyAtoms: 150,
	/** Non-hydrogen atoms over all intermediates of one route (saved, imported or planned). */
	maxRouteHeavyAtoms: 10_000
} as const;

export type StructureLimit = keyof typeof STRUCTURE_LIMITS;

/**
 * Bytes each cache of the chemistry may hold, per process (each chemistry worker has its own).
 * Together about 100 MB: well inside a worker's heap limit (ORTHOGON_CHEM_WORKER_HEAP_MB).
 */
export const CACHE_BYTES = {
	/** Perceptions by structure text (src/lib/chem/perception-cache.ts). */
	perceptionByText: 32 * 2 ** 20,
	/** Parsed molecules by structure text (src/lib/chem/molecule-cache.ts); 1 KB an atom. */
	moleculesByText: 8 * 2 ** 20,
	/** Perceptions by canonical key (src/lib/chem/perception-cache.ts). */
	perceptionByKey: 16 * 2 ** 20,
	/** Survival of groups across a step (src/lib/rules/check/transformation.ts). */
	transformations: 24 * 2 ** 20,
	/** Protected intermediates drawn by the planner (src/lib/rules/plan/draw.ts). */
	drawnStructures: 16 * 2 ** 20,
	/** Atom mappings of steps kept between plans (src/lib/rules/plan/track.ts). */
	followedSteps: 8 * 2 ** 20,
	/** Compiled combined reactions (src/lib/chem/transform.ts); each counted at a fixed 16 KB. */
	combinedReactions: 4 * 2 ** 20
} as const;
