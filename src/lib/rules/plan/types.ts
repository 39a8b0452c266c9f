// The planner's vocabulary: what needs masking (a need), what could mask it (an option), and
// the ranked answer in the shape of `POST /api/plan`.

import type { SavedConditionKind } from '../../library/contract';
import type { RouteDocument } from '../../route/document';
import type { PgDrawback, ReagentConcern } from '../ids';

/** One free-group instance followed through the route, from the intermediate where it is first seen. */
export type Need = {
	/** Group id; a diol masked as one unit is `diol-1,2` or `diol-1,3`. */
	group: string;
	/** The free groups the unit stands for: the group itself, and a diol's alcohols. */
	members: string[];
	/** Atoms of the instance in the intermediate where it is first seen. */
	atoms: number[];
	/** Intermediate ids it lives in, from where it is first seen towards the target. */
	path: string[];
	/** Its atoms in every intermediate on its path. */
	atomsAt: Map<string, number[]>;
	/** Intermediate where the mask goes on: the one the first attacking step uses. */
	installAt: string;
	/** Intermediate where it must be free again: the one the step that works on it uses, or the target. */
	freeAt: string;
	/** The earliest intermediate it may come off at: the product of the last step that attacks it. */
	removableFrom: string;
	/** Ids of the steps that attack it while it stands by. */
	attackedAt: string[];
	/**
	 * `reacts`: a step's conditions react with it (rated `reacts`), so every plan masks it.
	 * `caution`: only caution ratings (an N–H that consumes a Grignard reagent): plans offer to
	 * mask it and say why, and the answer never reads "nothing needs masking".
	 */
	level: 'reacts' | 'caution';
	/**
	 * A caution chemists usually mask for rather than accept (rules/reactivity.json `usuallyMasked`):
	 * the first plans mask it, then one plan leaves it free. Other caution-level needs are left free
	 * by the first plan, and later plans offer the mask.
	 */
	usuallyMasked: boolean;
};

/**
 * A drawback of a PG or of the recipe that puts it on or takes it off, weighed above a bystander
 * caution, e.g. `{ kind: 'toxic-metal', note: 'HgCl2 removal: mercury waste' }`.
 */
export type Drawback = { kind: PgDrawback | ReagentConcern; note: string };

/**
 * How an added step puts a PG on or takes it off; `savedCondition` is the id of the team's saved
 * condition it follows (absent: a textbook recipe of the rule table).
 */
export type StepRecipe = { reagents: string; conditions: string[]; savedCondition?: string };

/** A way to mask one need: the PG and one install and one removal option. */
export type Option = {
	pg: string;
	/** The install transform (reaction SMARTS) that draws this PG on this need's group. */
	transform: string;
	install: StepRecipe;
	removal: StepRecipe;
	/** Intermediate it comes off at: the need's `freeAt`, or earlier once nothing attacks the group. */
	removeAt: string;
	cautions: number;
	harshness: number;
	/** The PG's own drawbacks that apply here and those of the recipes chosen, e.g. THP's new stereocentre on a chiral alcohol. */
	drawbacks: Drawback[];
	/** Place of the PG in the preference list for the need's group (rules/preferences.json); 0 is first. */
	preference: number;
	/** A drawback to say alongside the choice, e.g. THP's new stereocentre on a chiral alcohol; often empty. */
	why: string;
	/** Which free groups the install recipe converts, and which it takes first (rules/protecting-groups.json `takes`, `prefers`). */
	selectivity: {
		takes: readonly string[];
		prefers: readonly { group: string; over: readonly string[]; reason: string }[];
	};
};

export type Protection = {
	group: string;
	atoms: number[];
	intermediate: string;
	protectingGroup: string;
	install: { before: string } & StepRecipe;
	removal: { after: string } & StepRecipe;
};

export type Plan = {
	rank: number;
	score: number;
	protections: Protection[];
	route: RouteDocument;
	addedSteps: number;
	rationale: string[];
};

/**
 * A team's approved, not retired saved condition as the planner reads it (plain JSON from the
 * server), e.g. `{ protectingGroup: 'TBS', kind: 'install', reagents: 'TBSOTf, 2,6-lutidine,
 * CH2Cl2, −78 °C', yield: 94, uses: 3, … }`.
 */
export type SavedConditionEntry = {
	id: string;
	protectingGroup: string;
	kind: SavedConditionKind;
	reagents: string;
	yield: number | null;
	reference: string | null;
	scale: string | null;
	notes: string | null;
	/** Steps of the team's routes that follow it: of several entries for one PG and kind, the most used wins. */
	uses: number;
};

export type Unsolved = { group: string; atoms: number[]; reason: string };

export type PlanAnswer = { plans: Plan[]; unsolved?: Unsolved[] };

/** What a plan asks of the people who run it (added by the server, which runs the clash check). */
export type PlanSafety = {
	/** Hazard notes for the reagents of the steps the plan adds, e.g. NaH for a benzylation. */
	hazards: { step: string; reagent: string; note: string }[];
	/** `caution` items the re-check found anywhere in the protected route. */
	cautions: { step: string; message: string }[];
	/**
	 * Reagent text the re-check did not recognise, per step of the protected route (the plan's
	 * own steps and the ones it passes through): the plan is silent on what those reagents do.
	 */
	unrecognized: { step: string; text: string[] }[];
};
export type CheckedPlan = Plan & PlanSafety;
export type CheckedPlanAnswer = { plans: CheckedPlan[]; unsolved?: Unsolved[] };
