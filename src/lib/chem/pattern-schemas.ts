// The zod schemas of the perception rows in rules/groups.json and rules/protecting-groups.json
// (pattern conventions: patterns.ts). Apart from the compiler so that the rows' shape can be read
// in one place and reused (the API's rules endpoint, tests) without compiling anything.

import { z } from 'zod';

const idSchema = z.string().regex(/^[A-Za-z0-9,-]+$/, 'ids are letters, digits, "-" and ","');

/** One free functional group, e.g. `{ id: 'ketone', smarts: '[#6][CX3](=O)[#6]', pattern: '[#6][CX3;A:1](=O)[#6]' }`. */
export const groupPatternSchema = z
	.object({
		id: idSchema,
		label: z.string().min(1),
		/** Reference definition, as RDKit reads it; tests compare counts against RDKit with it. */
		smarts: z.string().min(1),
		/** openchemlib pattern; `:1` marks the key atom. Defaults to `smarts` (key atom = first atom). */
		pattern: z.string().min(1).optional(),
		/** Molecule features the pattern cannot match without (see MOLECULE_FEATURES in match.ts); skips hopeless searches. */
		needs: z.array(z.string()).default([]),
		source: z.string().min(1),
		notes: z.string().optional()
	})
	.loose();

/**
 * One protecting group's perception fields, e.g. `{ id: 'TBS', protects: ['alcohol-primary'],
 * patterns: ['[OX2;A:1]([#6:2])[Si]([CH3])([CH3])C([CH3])([CH3])[CH3]'], priority: 40 }`.
 * Loose: install, remove, stability and notes are merged into the same rows by other modules.
 */
export const protectingGroupPatternSchema = z
	.object({
		id: idSchema,
		label: z.string().min(1),
		/** Free groups it can mask, in the order `masks` is tried. */
		protects: z.array(idSchema).min(1),
		/** openchemlib SMARTS, any of which recognises the PG; roles by atom map number (see above). */
		patterns: z.array(z.string().min(1)).min(1),
		/**
		 * How removal is imagined when working out `masks`: `hydrogen` (the PG atoms leave and the
		 * masked atoms get H back: ethers, esters, carbamates) or `carbonyl` (the PG atoms leave and
		 * the masked carbon gets its =O back: acetals, dithianes).
		 */
		restore: z.enum(['hydrogen', 'carbonyl']).default('hydrogen'),
		/** Reported when the freed atom fits none of `protects` (e.g. Boc on an aniline N). */
		fallbackMasks: idSchema.optional(),
		/** Features or free-group ids the PG cannot be present without, e.g. ["silyl-ether"]; skips hopeless searches. */
		needs: z.array(z.string()).default([]),
		/** Higher wins when two PG matches claim the same atoms: the more specific PG gets the higher number. */
		priority: z.number().int(),
		/** Where the recognition patterns come from (the row's `source` credits its ratings). */
		patternSource: z.string().min(1)
	})
	.loose();

export type GroupPattern = z.output<typeof groupPatternSchema>;
export type ProtectingGroupPattern = z.output<typeof protectingGroupPatternSchema>;
