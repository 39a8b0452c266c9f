// The clash check's vocabulary. Kept free of the rule table's file formats: `CheckRules` is
// the narrow view of the table the check needs, so a team's override layer can sit behind it.

import type { PgSite } from '../ids';
import type { RuleLayer } from '../table-types';

export type Severity = 'clash' | 'caution';
export type ClashKind = 'removes-protecting-group' | 'attacks-free-group';

export type Clash = {
	severity: Severity;
	kind: ClashKind;
	/** The protecting group id (e.g. `TBS`) or free group id (e.g. `ketone`). */
	subject: string;
	condition: string;
	/** Atom indices in the step's substrate (convergent steps: the substrates in `from` order). */
	atoms: number[];
	message: string;
};

export type Hazard = { reagent: string; note: string };

export type StepToCheck = {
	id: string;
	/** One structure text, or several for a convergent step (SMILES may also be `.`-joined). */
	substrate: string | string[];
	product: string;
	conditions?: string[];
	reagents?: string;
};

/**
 * Why a step could not be checked, in the API's error terms: `invalid_structure` or
 * `structure_too_large` (a structure cannot be read) or `unknown_condition` (an unknown class id).
 */
export type StepCheckError = { code: string; message: string };

/**
 * One step's check answer, the type `POST /api/check` and `GET /api/routes/{id}/check` answer
 * and the browser reads (it imports this type; there is no copy to drift).
 */
export type StepCheck = {
	id: string;
	conditions: string[];
	/**
	 * Which reagent brought which classes, in the order typed, e.g. `{ reagent: 'K2CO3', text:
	 * 'K2CO3', conditions: ['base-aqueous'], context: { reagent: 'MeOH', why: '…' } }`. Absent on a
	 * route step that could not be checked.
	 */
	reagentClasses?: ReagentReading[];
	hazards: Hazard[];
	clashes: Clash[];
	/** Reagent text the table does not know, as typed (e.g. `['Grubbs II']`): its effect is not checked. */
	unrecognized: string[];
	/** Present when the step could not be checked at all: then `clashes` is empty but means nothing. */
	error?: StepCheckError;
};

/** The body of both check endpoints. */
export type CheckAnswer = { steps: StepCheck[] };

/** The other reagent of the step whose presence picked a reagent's classes, and why. */
export type ReagentContext = { reagent: string; why: string };

export type ReagentMatch = {
	reagent: string;
	text: string;
	conditions: string[];
	context?: ReagentContext & { text: string };
};

/** One reagent of a step as the answer reports it (see `StepCheck.reagentClasses`). */
export type ReagentReading = {
	reagent: string;
	text: string;
	conditions: string[];
	context?: ReagentContext;
};

/** What the check reads from the rule table. */
export type CheckRules = {
	conditionIds: readonly string[];
	conditionLabel(conditionId: string): string;
	/**
	 * `reagents`: canonical names of the reagents that brought the condition (may refine the rating);
	 * `site`: what the PG sits on (`aromatic-nitrogen`, `aryl-oxygen`), when known; the answer's
	 * `site` says the rating is the one for that site.
	 */
	stability(
		pgId: string,
		conditionId: string,
		reagents: readonly string[],
		site?: PgSite
	): {
		rating: 'stable' | 'caution' | 'labile';
		source: string;
		reason?: string;
		site?: PgSite;
		/** `override`: the team's layer decided the rating (its message says "team rule:"). */
		layer?: RuleLayer;
	};
	protectingGroupLabel(pgId: string): string;
	/** `reagents`: canonical names of the reagents that brought the condition (none: the class rating). */
	reactivity(
		groupId: string,
		conditionId: string,
		reagents?: readonly string[]
	): {
		rating: 'reacts' | 'caution';
		reason: string;
		source: string;
		/** A caution chemists usually mask for (the planner's first plans mask it). */
		usuallyMasked?: true;
		/** `override`: the team's layer decided the rating (its message says "team rule:"). */
		layer?: RuleLayer;
	} | null;
	groupLabel(groupId: string): string;
	/**
	 * Why a PG install recipe that brings `condition` through one of `reagents` takes free group
	 * `first` before `over` (rules/protecting-groups.json `prefers`), or null, e.g. TBDPSCl, a
	 * primary alcohol before a secondary one. Optional: a rule view without install data has none.
	 */
	installPreference?(
		reagents: readonly string[],
		condition: string,
		first: string,
		over: string
	): string | null;
	classify(reagents: string): {
		conditions: string[];
		matched: ReagentMatch[];
		hazards: Hazard[];
		/** Fragments of the text that name nothing in the table, as typed. */
		unknown: string[];
	};
};

export class UnknownConditionError extends Error {
	/** The problem without the step's name, for an answer that already belongs to the step. */
	readonly problem: string;
	constructor(
		readonly stepId: string,
		readonly unknown: string[],
		valid: readonly string[]
	) {
		const names = `unknown condition ${unknown.map((u) => `"${u}"`).join(', ')}; valid ids are: ${valid.join(', ')}.`;
		super(`Step "${stepId}" names ${names}`);
		this.problem = `It names ${names}`;
	}
}

export class StepStructureError extends Error {
	constructor(
		readonly stepId: string,
		readonly role: 'substrate' | 'product',
		detail: string,
		/** Why the structure was refused (a StructureErrorCode such as `too_large`), when known. */
		readonly reason?: string
	) {
		super(`Step "${stepId}": the ${role} cannot be read — ${detail}`);
		this.problem = `The ${role} cannot be read — ${detail}`;
	}
	/** The problem without the step's name, for an answer that already belongs to the step. */
	readonly problem: string;
}
