// The perception rules, read from rules/groups.json and rules/protecting-groups.json, validated
// with zod and compiled once into openchemlib query fragments.
//
// Pattern conventions (both files). `smarts` in groups.json is the reference definition exactly
// as RDKit reads it; `pattern` is what openchemlib runs. They differ in two ways only:
//   - `;A` (not aromatic) is added where the reference writes an aliphatic element symbol,
//     because openchemlib's SMARTS does not restrict upper-case C, N, O, S to non-aromatic atoms;
//   - atom map numbers carry roles. In groups.json `:1` marks the key atom. In
//     protecting-groups.json `:1` marks the masked atoms (the atoms of the free group the PG
//     stands in for, kept on removal; the first one is the key atom), `:2` marks substrate
//     context (matched, not part of the PG), and every unmapped atom belongs to the PG and leaves
//     when it is removed.

import { z } from 'zod';
import { Molecule, SmilesParser } from 'openchemlib';
import { MOLECULE_FEATURES } from './match';
import { looseQuery, type LooseQuery } from './prefilter';
import { exactQuery, type ExactQuery } from './smarts-query';
import { queryElements } from './smarts-plan';
import groupsJson from '../../../rules/groups.json';
import protectingGroupsJson from '../../../rules/protecting-groups.json';

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

/** A pattern ready for searching (match.ts): in TypeScript when `exact` is there, else with openchemlib. */
export type CompiledPattern = {
	smarts: string;
	fragment: Molecule;
	/**
	 * Atoms by role, as indices into the mappings findMatches returns: SMARTS order for the exact
	 * query, fragment order for openchemlib (which inserts the atoms of `!$()` exclusions).
	 */
	key: number;
	masked: number[];
	context: number[];
	/** Atomic numbers the pattern cannot match without: a cheap pre-check before searching. */
	requiredElements: number[];
	/** The same SMARTS as a loose TypeScript test (prefilter.ts), null when it cannot be read there. */
	loose: LooseQuery | null;
	/** The SMARTS as an exact TypeScript query (smarts-query.ts), null when only openchemlib reads it. */
	exact: ExactQuery | null;
};

export type CompiledGroup = GroupPattern & { compiled: CompiledPattern };
export type CompiledProtectingGroup = ProtectingGroupPattern & { compiled: CompiledPattern[] };
export type PerceptionRules = {
	groups: CompiledGroup[];
	groupsById: Map<string, CompiledGroup>;
	protectingGroups: CompiledProtectingGroup[];
};

export class RuleTableError extends Error {
	constructor(file: string, path: (string | number)[], reason: string) {
		super(
			`${file}${path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${p}`)).join('')}: ${reason}`
		);
		this.name = 'RuleTableError';
	}
}

const smartsParser = new SmilesParser({ smartsMode: 'smarts' });

/** Compiles one SMARTS for openchemlib, e.g. `compilePattern('[OX2H;A:1]c', 'groups.json', ['phenol'])`. */
export function compilePattern(
	smarts: string,
	file: string,
	path: (string | number)[]
): CompiledPattern {
	let fragment: Molecule;
	try {
		fragment = smartsParser.parseMolecule(smarts, { noCoordinates: true });
	} catch (caught) {
		throw new RuleTableError(
			file,
			path,
			`openchemlib cannot read the SMARTS ${smarts}: ${String(caught)}`
		);
	}
	fragment.setFragment(true);
	const fragmentMapNumbers = Array.from({ length: fragment.getAllAtoms() }, (_, atom) =>
		fragment.getAtomMapNo(atom)
	);
	const fragmentRoles = roles(fragmentMapNumbers);
	const exact = exactQuery(smarts);
	// Both readings must see the same roles; if not, openchemlib's reading is the one used.
	const exactRoles = exact && roles(exact.mapNumbers);
	const agree =
		exactRoles &&
		exactRoles.masked.length === fragmentRoles.masked.length &&
		exactRoles.context.length === fragmentRoles.context.length;
	const used = agree ? exactRoles : fragmentRoles;
	return {
		smarts,
		fragment,
		...used,
		requiredElements: requiredElements(smarts, file, path),
		loose: looseQuery(smarts),
		exact: agree ? exact : null
	};
}

/** Atoms by map number: `:1` masked (the first is the key), `:2` context. */
function roles(mapNumbers: number[]): { key: number; masked: number[]; context: number[] } {
	const masked: number[] = [];
	const context: number[] = [];
	mapNumbers.forEach((map, atom) => {
		if (map === 1) {
			masked.push(atom);
		} else if (map === 2) {
			context.push(atom);
		}
	});
	return { key: masked[0] ?? 0, masked, context };
}

/** The element of a pattern's key atom (null: not one element), whichever reading it was compiled with. */
export function keyElement(pattern: CompiledPattern): number | null {
	if (!pattern.exact) {
		return pattern.fragment.getAtomicNo(pattern.key);
	}
	const elements = queryElements(pattern.exact)[pattern.key];
	return elements?.length === 1 ? elements[0]! : null;
}

/** Elements named by plain (non-list, non-negated) atoms outside recursive `$()` parts. */
function requiredElements(smarts: string, file: string, path: (string | number)[]): number[] {
	const plain = stripRecursive(smarts);
	const fragment = smartsParser.parseMolecule(plain, { noCoordinates: true });
	const elements = new Set<number>();
	for (let atom = 0; atom < fragment.getAllAtoms(); atom++) {
		const list = fragment.getAtomList(atom);
		if (list && list.length > 0) {
			continue;
		}
		if (fragment.getAtomLabel(atom) === '') {
			continue;
		} // 'any atom' style queries
		elements.add(fragment.getAtomicNo(atom));
	}
	if (elements.size === 0) {
		throw new RuleTableError(file, path, `the SMARTS ${smarts} names no element`);
	}
	return [...elements];
}

function stripRecursive(smarts: string): string {
	let out = '';
	for (let i = 0; i < smarts.length; i++) {
		if (smarts.startsWith('$(', i)) {
			let depth = 0;
			let j = i + 1;
			for (; j < smarts.length; j++) {
				if (smarts[j] === '(') {
					depth++;
				} else if (smarts[j] === ')' && --depth === 0) {
					break;
				}
			}
			// Drop the primitive and the operator that joined it (`;!$(...)` or `&$(...)`).
			out = out.replace(/[;&,]?!?$/, '');
			i = j;
			continue;
		}
		out += smarts[i];
	}
	return out;
}

/** Validates and compiles raw rule rows, e.g. `compileRules(groupsJson, protectingGroupsJson)`; throws RuleTableError naming file, path and reason. */
export function compileRules(rawGroups: unknown, rawProtectingGroups: unknown): PerceptionRules {
	const groups = parseRows(z.array(groupPatternSchema), rawGroups, 'rules/groups.json');
	const protectingGroups = parseRows(
		z.array(protectingGroupPatternSchema),
		rawProtectingGroups,
		'rules/protecting-groups.json'
	);
	const groupsById = new Map<string, CompiledGroup>();
	const compiledGroups = groups.map((group, index) => {
		if (groupsById.has(group.id)) {
			throw new RuleTableError('rules/groups.json', [index, 'id'], `duplicate id ${group.id}`);
		}
		checkNeeds(group.needs, [], 'rules/groups.json', index);
		const compiled = {
			...group,
			compiled: compilePattern(group.pattern ?? group.smarts, 'rules/groups.json', [
				index,
				'pattern'
			])
		};
		groupsById.set(group.id, compiled);
		return compiled;
	});
	const seen = new Set<string>();
	const compiledPgs = protectingGroups.map((pg, index) => {
		const file = 'rules/protecting-groups.json';
		if (seen.has(pg.id)) {
			throw new RuleTableError(file, [index, 'id'], `duplicate id ${pg.id}`);
		}
		seen.add(pg.id);
		for (const [i, id] of [
			...pg.protects,
			...(pg.fallbackMasks ? [pg.fallbackMasks] : [])
		].entries()) {
			if (!groupsById.has(id)) {
				throw new RuleTableError(
					file,
					[index, 'protects', i],
					`${id} is not a group in rules/groups.json`
				);
			}
		}
		checkNeeds(pg.needs, [...groupsById.keys()], file, index);
		const compiled = pg.patterns.map((smarts, p) => {
			const pattern = compilePattern(smarts, file, [index, 'patterns', p]);
			if (pattern.masked.length === 0) {
				throw new RuleTableError(file, [index, 'patterns', p], 'no atom is marked :1 (masked)');
			}
			if (pg.restore === 'carbonyl' && keyElement(pattern) !== 6) {
				throw new RuleTableError(
					file,
					[index, 'patterns', p],
					'restore "carbonyl" needs the first :1 atom to be the acetal carbon'
				);
			}
			return pattern;
		});
		return { ...pg, compiled };
	});
	return { groups: compiledGroups, groupsById, protectingGroups: compiledPgs };
}

function checkNeeds(needs: string[], groupIds: string[], file: string, index: number) {
	needs.forEach((need, i) => {
		if (!(MOLECULE_FEATURES as readonly string[]).includes(need) && !groupIds.includes(need)) {
			throw new RuleTableError(
				file,
				[index, 'needs', i],
				`${need} is neither a molecule feature (${MOLECULE_FEATURES.join(', ')}) nor a group id`
			);
		}
	});
}

function parseRows<S extends z.ZodType>(schema: S, raw: unknown, file: string): z.output<S> {
	const result = schema.safeParse(raw);
	if (!result.success) {
		const issue = result.error.issues[0]!;
		throw new RuleTableError(file, issue.path as (string | number)[], issue.message);
	}
	return result.data;
}

let loaded: PerceptionRules | null = null;

/** The rule table of this checkout, compiled on first use, e.g. `perceptionRules().groups.length` → 29. */
export function perceptionRules(): PerceptionRules {
	loaded ??= compileRules(groupsJson, protectingGroupsJson);
	return loaded;
}
