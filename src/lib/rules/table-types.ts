/**
 * The shape of the rule table and of its answers, apart from the code that builds it (table.ts) so
 * the readers of the table (check, planner, API) can see what they get in one short file.
 */
import type { ReagentClassifier } from './classify';
import type {
	ConditionId,
	FreeGroupId,
	PgSite,
	ProtectingGroupId,
	ReactivityRating,
	StabilityRating
} from './ids';
import type { RuleOverrides } from './overrides';
import type {
	Condition,
	Preference,
	ProtectingGroupConditions,
	ReactivityEntry,
	Reagent
} from './schemas';

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
