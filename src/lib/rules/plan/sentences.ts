// The sentences of a plan and of an unsolved need: why each PG masks its group where it does, why
// nothing fits, which PGs were left out because they clash with the others. Apart from index.ts,
// which decides the plans; this file only words them.

import { teamRule } from '../check/messages';
import { maskedBecause } from './cautions';
import type { CheckRules } from '../check/types';
import { conflict } from './conflict';
import type { Judged } from './options';
import type { RouteTree } from './tree';
import type { Need, Option, Unsolved } from './types';

/** Why this option masks this need, e.g. "TBS masks the primary alcohol through step 2: on with …". */
export function because(rules: CheckRules, tree: RouteTree, need: Need, option: Option): string {
	const threats = need.attackedAt.map((id) => tree.stepName(id)).join(', ');
	const off =
		option.removeAt !== need.freeAt
			? `after ${tree.stepName(tree.made.get(option.removeAt)!.id)}, as soon as nothing attacks it`
			: need.freeAt === tree.target
				? 'at the end'
				: `before ${tree.stepName(tree.next.get(need.freeAt)!.id)}, where it reacts`;
	const cautions = option.cautions
		? ` (${option.cautions} caution rating${option.cautions > 1 ? 's' : ''} to watch)`
		: '';
	const level =
		need.level === 'caution'
			? ` ${maskedBecause(rules, tree, need)}`
			: teamRuleNeed(rules, tree, need);
	return `${option.pg} masks the ${rules.groupLabel(need.group)} through ${threats}: on with ${option.install.reagents}, off ${off} with ${option.removal.reagents}${cautions}.${option.why ? ` ${option.why}` : ''}${level}`;
}

/** Said when the team's override, not the textbook, makes a step attack the group; else ''. */
function teamRuleNeed(rules: CheckRules, tree: RouteTree, need: Need): string {
	const reason = teamRuleAttack(rules, tree, need);
	return reason ? ` It is masked because of the team's override (${reason}).` : '';
}

/** "team rule: <reason>" of the team's override that makes a step attack the group, or null. */
function teamRuleAttack(rules: CheckRules, tree: RouteTree, need: Need): string | null {
	for (const stepId of need.attackedAt) {
		for (const c of tree.conditions.get(stepId)!) {
			for (const group of need.members) {
				const rule = rules.reactivity(group, c.id, c.reagents);
				if (rule?.rating === 'reacts' && rule.layer === 'override') {
					return teamRule(rule.reason).slice(0, -1);
				}
			}
		}
	}
	return null;
}

/** Why no PG can mask a need: nothing in the table masks it, one step removes every candidate, or each was rejected. */
export function whyUnsolved(
	rules: CheckRules,
	tree: RouteTree,
	need: Need,
	judged: Judged[]
): Unsolved {
	const label = rules.groupLabel(need.group);
	const byTeam = teamRuleAttack(rules, tree, need);
	const first = tree.stepName(need.attackedAt[0]!);
	// Where the team's override makes the step attack the group, the sentence says so.
	const attacker = `${first}${byTeam ? ` (${byTeam})` : ''}`;
	if (judged.length === 0) {
		return {
			group: need.group,
			atoms: need.atoms,
			reason: `${capital(attacker)} attacks the free ${label}, and no protecting group in the rule table masks a ${label}.`
		};
	}
	const killer = judged.every((j) => j.killedAt !== undefined && j.killedAt === judged[0]!.killedAt)
		? judged[0]!.killedAt
		: undefined;
	if (killer !== undefined) {
		return {
			group: need.group,
			atoms: need.atoms,
			reason: `${capital(tree.stepName(killer))} makes it impossible: the free ${label} must be masked from ${first} on, and that step's conditions would remove every protecting group that masks it (${judged.map((j) => j.pg).join(', ')}).`
		};
	}
	return {
		group: need.group,
		atoms: need.atoms,
		reason: `${capital(attacker)} attacks the free ${label}, and no protecting group fits: ${judged.map((j) => j.rejected).join('; ')}.`
	};
}

const capital = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** E.g. `['TBS', 'dioxolane']` → "TBS and dioxolane together"; `['THP', 'THP']` → "both THP groups at once". */
export function together(pgs: string[]): string {
	const unique = [...new Set(pgs)];
	if (unique.length > 1) {
		return `${unique.join(' and ')} together`;
	}
	return pgs.length === 2
		? `both ${unique[0]} groups at once`
		: `all ${pgs.length} ${unique[0]} groups at once`;
}

/**
 * Protecting groups that suit a group on their own but not beside this plan's other choices, and
 * why, e.g. "dioxolane not used for the ketone: putting the acetonide on (…) would strip the
 * dioxolane on the ketone." At most three per group; a PG merely ranked lower is not mentioned.
 */
export function notTogether(
	rules: CheckRules,
	needs: Need[],
	judged: Judged[][],
	chosen: Option[]
): string[] {
	return needs.flatMap((need, i) =>
		judged[i]!.filter((j) => j.options.length && j.pg !== chosen[i]!.pg)
			.flatMap((j) => {
				let reason: string | null = null;
				for (const option of j.options) {
					const clash = chosen
						.map((other, k) =>
							k === i
								? null
								: (conflict(rules, needs, i, option, k, other) ??
									conflict(rules, needs, k, other, i, option))
						)
						.find((r) => r !== null);
					if (!clash) {
						return [];
					}
					reason ??= clash;
				}
				return reason
					? [`${j.pg} not used for the ${rules.groupLabel(need.group)}: ${reason}.`]
					: [];
			})
			.slice(0, 3)
	);
}
