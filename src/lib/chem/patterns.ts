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
import { MOLECULE_FEATURES } from './match';
import {
	compilePattern,
	keyElement,
	RuleTableError,
	type CompiledPattern
} from './compile-pattern';
import {
	groupPatternSchema,
	protectingGroupPatternSchema,
	type GroupPattern,
	type ProtectingGroupPattern
} from './pattern-schemas';
import groupsJson from '../../../rules/groups.json';
import protectingGroupsJson from '../../../rules/protecting-groups.json';

// The row schemas and the compiling of one pattern live in pattern-schemas.ts and
// compile-pattern.ts; callers keep importing them from here.
export {
	groupPatternSchema,
	protectingGroupPatternSchema,
	type GroupPattern,
	type ProtectingGroupPattern
} from './pattern-schemas';
export {
	compilePattern,
	keyElement,
	RuleTableError,
	type CompiledPattern
} from './compile-pattern';

export type CompiledGroup = GroupPattern & { compiled: CompiledPattern };
export type CompiledProtectingGroup = ProtectingGroupPattern & { compiled: CompiledPattern[] };
export type PerceptionRules = {
	groups: CompiledGroup[];
	groupsById: Map<string, CompiledGroup>;
	protectingGroups: CompiledProtectingGroup[];
};

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
