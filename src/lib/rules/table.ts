/**
 * The rule table as the engine reads it: validated defaults plus an optional override layer.
 *
 * Layering: `loadRuleTable(overrides)` validates the bundled defaults once, then wraps them with
 * one team's layer. `stabilityOf` and `reactivityOf` look in the layer first (a row for one of
 * the step's reagents, then a row for the class) and fall back to the defaults; the answer says
 * which layer it came from, so a clash message can credit the team's reason instead of the
 * textbook's. The defaults are never modified, and tables are frozen.
 */ import { compileClassifier, type ReagentClassifier } from './classify';
import { DEFAULT_RULE_FILES } from './default-files';
import type { ConditionId, FreeGroupId, PgSite, ProtectingGroupId, StabilityRating } from './ids';
import { parseOverrides, type RuleOverrides, type RuleOverridesInput } from './overrides';
import type { Condition, ProtectingGroupConditions, ReactivityEntry } from './schemas';
import { reactivityForReagents, withReagentRatings } from './table-reagent-ratings';
import { cellKey, indexOverrides, worstReactivity, worstStability } from './table-overrides';
import type { ReactivityAnswer, RuleTable, StabilityAnswer } from './table-types';
import { parseRuleFiles, type RuleData } from './validate';

// The table's types live in table-types.ts; callers keep importing them from here.
export type { ReactivityAnswer, RuleLayer, RuleTable, StabilityAnswer } from './table-types';

function deepFreeze<T>(value: T): T {
	if (value && typeof value === 'object' && !Object.isFrozen(value)) {
		Object.freeze(value);
		for (const inner of Object.values(value)) {
			deepFreeze(inner);
		}
	}
	return value;
}

interface Base {
	data: RuleData;
	classify: ReagentClassifier;
	conditions: Map<ConditionId, Condition>;
	pgs: Map<ProtectingGroupId, ProtectingGroupConditions>;
	reactivity: Map<string, ReactivityEntry>;
	/** Finer class → the broader class it inherits from. */
	broader: Map<ConditionId, ConditionId>;
}

const pairKey = (a: string, b: ConditionId) => `${a}\u0000${b}`;

function prepare(data: RuleData): Base {
	deepFreeze(data);
	return {
		data,
		classify: compileClassifier(data.reagents),
		conditions: new Map(data.conditions.map((c) => [c.id, c])),
		pgs: new Map(data.protectingGroups.map((pg) => [pg.id, pg])),
		reactivity: new Map(data.reactivity.map((r) => [pairKey(r.group, r.condition), r])),
		broader: new Map(
			data.conditions.flatMap((c) => (c.refines ? [[c.id, c.refines] as const] : []))
		)
	};
}

function layer(base: Base, overrides: RuleOverrides | null): RuleTable {
	const rows = indexOverrides(overrides);
	const withBroader = (condition: ConditionId): ConditionId[] => {
		const broader = base.broader.get(condition);
		return broader ? [condition, broader] : [condition];
	};
	const overrideSource = (source: string | undefined) =>
		source ?? `${overrides?.name} (team override)`;
	const fromRow = (row: { rating: StabilityRating; reason: string; source?: string }) => ({
		rating: row.rating,
		source: overrideSource(row.source),
		reason: row.reason,
		layer: 'override' as const
	});
	// Most layers (and the defaults) have no reagent rows: their lookups skip the per-reagent pass.
	const reagentRows = {
		stability: overrides?.stability.some((row) => row.reagent) ?? false,
		reactivity: overrides?.reactivity.some((row) => row.reagent) ?? false
	};
	/** The row the team wrote for this reagent under the class or its broader class, if any. */
	const reagentRow = <R>(rowsByCell: Map<string, R>, subject: string, condition: ConditionId) => {
		return (reagent: string): R | undefined => {
			for (const id of withBroader(condition)) {
				const row = rowsByCell.get(cellKey(subject, id, reagent));
				if (row) {
					return row;
				}
			}
			return undefined;
		};
	};

	/** The class-level answer: the class itself (team's class row, then defaults), then its broader class. */
	const stabilityOfClass = (
		pg: ProtectingGroupId,
		condition: ConditionId,
		reagents: readonly string[],
		site: PgSite | undefined
	): StabilityAnswer => {
		const row = table.protectingGroup(pg);
		for (const id of withBroader(condition)) {
			const override = rows.stability.get(cellKey(pg, id));
			if (override) {
				return fromRow(override);
			}
			// What the PG sits on (an indole N, a phenol O) counts at the same level, before the row's rating.
			const onSite = site && row.whereOn.find((w) => w.site === site && w.condition === id);
			if (onSite) {
				return withReagentRatings(row, id, onSite.rating, reagents, onSite);
			}
			const rating = row.stability[id];
			if (rating !== undefined) {
				return withReagentRatings(row, id, rating, reagents);
			}
		}
		throw new Error(`${pg} has no rating under ${condition} or its broader class`);
	};

	const reactivityOfClass = (
		group: FreeGroupId,
		condition: ConditionId,
		reagents: readonly string[]
	): ReactivityAnswer | undefined => {
		for (const id of withBroader(condition)) {
			const override = rows.reactivity.get(cellKey(group, id));
			if (override) {
				return reactivityFromRow(override);
			}
			const entry = base.reactivity.get(pairKey(group, id));
			if (!entry) {
				continue;
			}
			const { rating, reason } = reactivityForReagents(entry, reagents);
			if (rating === 'none') {
				return undefined;
			}
			const answer: ReactivityAnswer = { rating, reason, source: entry.source, layer: 'default' };
			if (rating === 'caution' && entry.usuallyMasked) {
				answer.usuallyMasked = true;
			}
			return answer;
		}
		return undefined;
	};
	const reactivityFromRow = (row: RuleOverrides['reactivity'][number]) =>
		row.rating === 'none'
			? undefined
			: ({
					rating: row.rating,
					reason: row.reason,
					source: overrideSource(row.source),
					layer: 'override'
				} satisfies ReactivityAnswer);

	const table: RuleTable = {
		conditions: base.data.conditions,
		reagents: base.data.reagents,
		reactivity: base.data.reactivity,
		protectingGroups: base.data.protectingGroups,
		preferences: base.data.preferences,
		overrides,
		condition(id) {
			const found = base.conditions.get(id);
			if (!found) {
				throw new Error(`unknown condition id "${id}"`);
			}
			return found;
		},
		protectingGroup(id) {
			const found = base.pgs.get(id);
			if (!found) {
				throw new Error(`unknown protecting group id "${id}"`);
			}
			return found;
		},
		stabilityOf(pg, condition, reagents = [], site) {
			// A reagent's own row beats the class: each reagent gets its row or the class answer for
			// it alone, and the worst applies (as the defaults' reagent ratings do).
			const ownRow = reagentRow(rows.stability, pg, condition);
			if (!reagentRows.stability || !reagents.some((r) => ownRow(r))) {
				return stabilityOfClass(pg, condition, reagents, site);
			}
			return worstStability(
				reagents.map((r) => {
					const own = ownRow(r);
					return own ? fromRow(own) : stabilityOfClass(pg, condition, [r], site);
				})
			);
		},
		ratingsOf(pg) {
			const ids = base.data.conditions.map((c) => c.id);
			return Object.fromEntries(ids.map((id) => [id, table.stabilityOf(pg, id).rating])) as Record<
				ConditionId,
				StabilityRating
			>;
		},
		reactivityOf(group, condition, reagents = []) {
			const ownRow = reagentRow(rows.reactivity, group, condition);
			if (!reagentRows.reactivity || !reagents.some((r) => ownRow(r))) {
				return reactivityOfClass(group, condition, reagents);
			}
			return worstReactivity(
				reagents.map((r) => {
					const own = ownRow(r);
					return own ? reactivityFromRow(own) : reactivityOfClass(group, condition, [r]);
				})
			);
		},
		conditionsForReagents: base.classify
	};
	return deepFreeze(table);
}

let defaults: Base | undefined;

/** Builds a table from already-read files, e.g. `buildRuleTable({ conditions, reagents, … })` in a test. */
export function buildRuleTable(
	raw: Parameters<typeof parseRuleFiles>[0],
	overrides?: RuleOverridesInput
): RuleTable {
	return layer(
		prepare(parseRuleFiles(raw)),
		overrides === undefined ? null : parseOverrides(overrides)
	);
}

/** The bundled table, optionally under a team's layer, e.g. `loadRuleTable({ name: 'Team Kestrel', stability: [] })`. */
export function loadRuleTable(overrides?: RuleOverridesInput): RuleTable {
	defaults ??= prepare(parseRuleFiles(DEFAULT_RULE_FILES));
	return layer(defaults, overrides === undefined ? null : parseOverrides(overrides));
}
