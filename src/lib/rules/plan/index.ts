// The strategy planner: which free groups a route must mask, with which PG, on and off where,
// ranked, drawn and re-checked. Pure: the caller passes the re-check (the clash check of a route).

import type { RouteDocument } from '../../route/document';
import { checkRulesFrom } from '../check/rules-adapter';
import { cannotMask, joinTiers, leftFree, type Tier } from './cautions';
import type { CheckRules } from '../check/types';
import { loadRuleTable, type RuleTable } from '../table';
import { clearDrawCache } from './draw';
import { judgeCandidates } from './options';
import { drawRoute } from './route';
import { withRanking } from './rationale';
import type { Choice } from './cost';
import { followSavedConditions, preferredEntries, type Preferred } from './saved-conditions';
import { searchChoices } from './search';
import { because, notTogether, together, whyUnsolved } from './sentences';
import { clearFollowCache, findNeeds } from './track';
import { routeTree, type RouteTree } from './tree';
import type { Need, Plan, PlanAnswer, SavedConditionEntry, Unsolved } from './types';

export type * from './types';

/** Forgets the planner's caches (mappings and drawings), e.g. before a cold benchmark run. */
export function clearPlanCaches(): void {
	clearFollowCache();
	clearDrawCache();
}

/** The first `clash` the re-check finds in a route, as a message, or null when it is clean. */
export type Verify = (route: RouteDocument) => string | null;
export type PlanOptions = {
	verify: Verify;
	table?: RuleTable;
	rules?: CheckRules;
	plans?: number;
	/** The team's approved, not retired saved conditions: the added steps follow them where the re-check allows. */
	savedConditions?: readonly SavedConditionEntry[];
};

const MAX_PLANS = 5;
// More joint choices than plans are drawn, because the re-check may still drop some.
const SEARCH_WIDTH = 20;

type Context = {
	doc: RouteDocument;
	table: RuleTable;
	rules: CheckRules;
	tree: RouteTree;
	verify: Verify;
	/** The team's entry to follow per PG and kind. */
	preferred: Map<string, Preferred>;
};
type Solved = { plans: Plan[]; unsolved?: Unsolved[] };

/** Ranked plans for a route, e.g. a ketone standing by a Grignard step → dioxolane on before it, off at the end. */
export function planRoute(doc: RouteDocument, options: PlanOptions): PlanAnswer {
	const table = options.table ?? loadRuleTable();
	const rules = options.rules ?? checkRulesFrom(table);
	const tree = routeTree(doc, rules);
	if (typeof tree === 'string') {
		return { plans: [], unsolved: [{ group: 'route', atoms: [], reason: tree }] };
	}
	const ctx: Context = {
		doc,
		table,
		rules,
		tree,
		verify: options.verify,
		preferred: preferredEntries(options.savedConditions ?? [])
	};
	const limit = options.plans ?? MAX_PLANS;
	const needs = findNeeds(tree, rules);
	const required = needs.filter((n) => n.level === 'reacts');
	const cautions = needs.filter((n) => n.level === 'caution');
	if (cautions.length === 0) {
		return solve(ctx, required, limit);
	}
	// Caution-level needs that some PG can mask (judged beside the others) are offered a mask;
	// the rest stay free and every plan says so.
	const maskable = cautions.filter((_, k) =>
		judgeCandidates(table, rules, tree, needs, required.length + k).some((j) => j.options.length)
	);
	const cannot = cautions
		.filter((n) => !maskable.includes(n))
		.map((n) => cannotMask(rules, tree, n, 'no protecting group in the rule table fits it here'));
	const usual = maskable.filter((n) => n.usuallyMasked);
	const other = maskable.filter((n) => !n.usuallyMasked);
	// Tiers, best first: mask what chemists usually mask; leave every caution free; mask them all.
	// Each tier holds the one before it or is held by it, so equal sizes mean equal tiers.
	const tiers: Tier[] = [
		{ kind: 'usual', needs: [...required, ...usual] },
		{ kind: 'free', needs: required },
		{ kind: 'all', needs: [...required, ...usual, ...other] }
	].filter(
		(tier, i, all) => all.findIndex((t) => t.needs.length === tier.needs.length) === i
	) as Tier[];
	const solvedTiers: Plan[][] = [];
	let firstUnsolved: Solved | undefined;
	tiers.forEach((tier, i) => {
		const room = limit - solvedTiers.flat().length - (tiers.length - 1 - i);
		const notes = [
			...maskable.filter((n) => !tier.needs.includes(n)).map((n) => leftFree(rules, tree, n)),
			...cannot
		];
		const solved = room > 0 ? solve(ctx, tier.needs, room, notes) : { plans: [] };
		if (!solved.plans.length) {
			firstUnsolved ??= solved;
		}
		solvedTiers.push(solved.plans);
	});
	const plans = joinTiers(rules, tree, tiers, solvedTiers, { usual, other });
	if (plans.length) {
		return { plans };
	}
	return firstUnsolved ?? { plans: [] };
}

/** The plans that mask exactly `needs`, best first, each re-checked; `notes` are added to every plan's rationale. */
function solve(ctx: Context, needs: Need[], limit: number, notes: string[] = []): Solved {
	const { doc, table, rules, tree } = ctx;
	if (needs.length === 0) {
		const problem = ctx.verify(doc);
		if (problem) {
			return {
				plans: [],
				unsolved: [
					{
						group: 'route',
						atoms: [],
						reason: `No free group needs masking, but the route still clashes: ${problem}`
					}
				]
			};
		}
		// Never "nothing needs masking" while cautions stand: the notes name them.
		const rationale = notes.length
			? notes
			: ['No step attacks a free group that stands by: nothing needs masking.'];
		return {
			plans: [{ rank: 1, score: 0, protections: [], route: doc, addedSteps: 0, rationale }]
		};
	}
	const judged = needs.map((_, i) => judgeCandidates(table, rules, tree, needs, i));
	const unsolved = needs.flatMap((need, i) =>
		judged[i]!.some((j) => j.options.length) ? [] : [whyUnsolved(rules, tree, need, judged[i]!)]
	);
	if (unsolved.length) {
		return { plans: [], unsolved };
	}
	const optionLists = judged.map((list) =>
		list
			.flatMap((j) => j.options)
			.sort((a, b) => a.cautions - b.cautions || a.harshness - b.harshness)
	);
	const plans: Plan[] = [];
	const ranked: Choice[] = [];
	let firstProblem: string | null = null;
	for (const choice of searchChoices(rules, needs, optionLists, SEARCH_WIDTH)) {
		if (plans.length >= limit) {
			break;
		}
		const textbook = drawRoute(doc, tree, needs, choice.options);
		const problem = ctx.verify(textbook.route);
		if (problem) {
			firstProblem ??= problem;
			continue;
		}
		const {
			drawn,
			options,
			notes: team
		} = followSavedConditions({
			...ctx,
			needs,
			options: choice.options,
			textbook
		});
		const rationale = [
			...needs.map((need, i) => because(rules, tree, need, options[i]!)),
			...team,
			...drawn.shared.map(
				({ pg, count }) =>
					`One protection step puts ${pg} on ${count} groups of the same kind at once.`
			),
			...drawn.merged.map(
				(pgs) =>
					`One deprotection step takes off ${together(pgs)}: they come off under the same conditions.`
			),
			...needs.flatMap((need, i) =>
				// The PGs the team's own rules rejected are named first: they changed the choice.
				judged[i]!.filter((j) => j.rejected)
					.sort((a, b) => Number(b.byTeamRule ?? false) - Number(a.byTeamRule ?? false))
					.slice(0, 4)
					.map((j) => `${j.rejected} (for the ${rules.groupLabel(need.group)}).`)
			),
			...notTogether(rules, needs, judged, choice.options),
			...notes
		];
		ranked.push(choice);
		plans.push({
			rank: plans.length + 1,
			score: choice.score,
			protections: drawn.protections,
			route: drawn.route,
			addedSteps: choice.addedSteps,
			rationale
		});
	}
	if (plans.length) {
		return { plans: withRanking(table, rules, needs, plans, ranked) };
	}
	const reason = firstProblem
		? `Every combination of admissible protecting groups still clashes when re-checked: ${firstProblem}`
		: 'No combination of protecting groups is orthogonal: each choice for one group would strip another.';
	return {
		plans: [],
		unsolved: needs.map((need) => ({ group: need.group, atoms: need.atoms, reason }))
	};
}
