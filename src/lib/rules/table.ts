/**
 * The rule table as the engine reads it: validated defaults plus an optional override layer.
 *
 * Layering: `loadRuleTable(overrides)` validates the bundled defaults once, then wraps them with
 * one team's layer. `stabilityOf` and `reactivityOf` look in the layer first and fall back to the
 * defaults; the answer says which layer it came from, so a clash message can credit the team's
 * reason instead of the textbook's. The defaults are never modified, and tables are frozen.
 */
import { compileClassifier, type ReagentClassifier } from './classify';
import { DEFAULT_RULE_FILES } from './default-files';
import type {
	ConditionId,
	FreeGroupId,
	PgSite,
	ProtectingGroupId,
	ReactivityRating,
	ReactivityRowRating,
	StabilityRating
} from './ids';
import { parseOverrides, type RuleOverrides, type RuleOverridesInput } from './overrides';
import type {
	Condition,
	Preference,
	ProtectingGroupConditions,
	ReactivityEntry,
	Reagent,
	WhereOnEntry
} from './schemas';
import { parseRuleFiles, type RuleData } from './validate';

export type RuleLayer = 'default' | 'override';

export interface StabilityAnswer {
	rating: StabilityRating;
	source: string;
	/** The override's reason; default ratings carry their reasons in the row's notes. */
	reason?: string;
	layer: RuleLayer;
	/** Set when the rating is the row's `whereOn` entry for what the PG sits on. */
	site?: PgSite;
}

export interface ReactivityAnswer {
	rating: ReactivityRating;
	reason: string;
	source: string;
	layer: RuleLayer;
	/** A caution chemists usually mask for rather than accept (the row's `usuallyMasked`). */
	usuallyMasked?: true;
}

export interface RuleTable {
	readonly conditions: readonly Condition[];
	readonly reagents: readonly Reagent[];
	readonly reactivity: readonly ReactivityEntry[];
	readonly protectingGroups: readonly ProtectingGroupConditions[];
	/** Which PGs a chemist reaches for first, per group type (rules/preferences.json). */
	readonly preferences: readonly Preference[];
	readonly overrides: RuleOverrides | null;
	condition(id: ConditionId): Condition;
	protectingGroup(id: ProtectingGroupId): ProtectingGroupConditions;
	/**
	 * `reagents` are the canonical names of the reagents that brought the condition; a PG row's
	 * `reagentRatings` refine the class rating for them (the worst one applies). `site` is what the
	 * PG sits on, when the caller knows it: the row's `whereOn` entry for it replaces the class rating.
	 */
	stabilityOf(
		pg: ProtectingGroupId,
		condition: ConditionId,
		reagents?: readonly string[],
		site?: PgSite
	): StabilityAnswer;
	/** The PG's rating under every class, finer classes resolved (what the API and screens show). */
	ratingsOf(pg: ProtectingGroupId): Record<ConditionId, StabilityRating>;
	/**
	 * `undefined` means no known problem (or a team override of `none`). `reagents` are the
	 * canonical names of the reagents that brought the condition; a row's `reagentRatings` refine
	 * its rating for them (the worst one applies).
	 */
	reactivityOf(
		group: FreeGroupId,
		condition: ConditionId,
		reagents?: readonly string[]
	): ReactivityAnswer | undefined;
	conditionsForReagents: ReagentClassifier;
}

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
const SEVERITY: Record<StabilityRating, number> = { stable: 0, caution: 1, labile: 2 };

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

/**
 * The answer for the reagents that brought a class: each reagent its own entry where the row
 * names it, else the row's answer; the worst one applies. No starting value, so a reagent's own
 * rating may be milder than the row's (PPTS and TBDPS; TFA and a tertiary alcohol).
 */
function worstForReagents<A extends { rating: string }>(
	rowAnswer: A,
	reagents: readonly string[],
	own: (reagent: string) => A | undefined,
	severity: Readonly<Record<string, number>>
): A {
	if (reagents.length === 0) {
		return rowAnswer;
	}
	return reagents
		.map((name) => own(name) ?? rowAnswer)
		.reduce((worst, next) => (severity[next.rating]! > severity[worst.rating]! ? next : worst));
}

/** A PG's default rating under one class, refined for the reagents that brought it. */
function withReagentRatings(
	row: ProtectingGroupConditions,
	condition: ConditionId,
	rating: StabilityRating,
	reagents: readonly string[],
	onSite?: WhereOnEntry
): StabilityAnswer {
	const classAnswer: StabilityAnswer = onSite
		? { rating, source: row.source, layer: 'default', reason: onSite.reason, site: onSite.site }
		: { rating, source: row.source, layer: 'default' };
	return worstForReagents(
		classAnswer,
		reagents,
		(name) => {
			const entry = row.reagentRatings.find((r) => r.reagent === name && r.condition === condition);
			return (
				entry && {
					rating: entry.rating,
					reason: entry.reason,
					source: row.source,
					layer: 'default'
				}
			);
		},
		SEVERITY
	);
}

const REACTS: Record<ReactivityRowRating, number> = { none: 0, caution: 1, reacts: 2 };

/**
 * A free group's default rating under one class, refined for the reagents that brought it, e.g.
 * a tertiary alcohol under TFA alone is `none`, under TFA and H2SO4 the row's `caution`.
 */
function reactivityForReagents(
	entry: ReactivityEntry,
	reagents: readonly string[]
): { rating: ReactivityRowRating; reason: string } {
	return worstForReagents<{ rating: ReactivityRowRating; reason: string }>(
		{ rating: entry.rating, reason: entry.reason },
		reagents,
		(name) => entry.reagentRatings.find((r) => r.reagent === name),
		REACTS
	);
}

function layer(base: Base, overrides: RuleOverrides | null): RuleTable {
	const stabilityOverride = new Map(
		(overrides?.stability ?? []).map((row) => [pairKey(row.protectingGroup, row.condition), row])
	);
	const reactivityOverride = new Map(
		(overrides?.reactivity ?? []).map((row) => [pairKey(row.group, row.condition), row])
	);
	const withBroader = (condition: ConditionId): ConditionId[] => {
		const broader = base.broader.get(condition);
		return broader ? [condition, broader] : [condition];
	};
	const overrideSource = (source: string | undefined) =>
		source ?? `${overrides?.name} (team override)`;

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
			const row = table.protectingGroup(pg);
			// Most specific first: the class itself (team layer, then defaults), then its broader class.
			for (const id of withBroader(condition)) {
				const override = stabilityOverride.get(pairKey(pg, id));
				if (override) {
					return {
						rating: override.rating,
						source: overrideSource(override.source),
						reason: override.reason,
						layer: 'override'
					};
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
		},
		ratingsOf(pg) {
			const ids = base.data.conditions.map((c) => c.id);
			return Object.fromEntries(ids.map((id) => [id, table.stabilityOf(pg, id).rating])) as Record<
				ConditionId,
				StabilityRating
			>;
		},
		reactivityOf(group, condition, reagents = []) {
			for (const id of withBroader(condition)) {
				const override = reactivityOverride.get(pairKey(group, id));
				if (override) {
					if (override.rating === 'none') {
						return undefined;
					}
					return {
						rating: override.rating,
						reason: override.reason,
						source: overrideSource(override.source),
						layer: 'override'
					};
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
