// Plain-language clash messages: the group, the condition class, the reagent that brought it
// in, the reason and the source, in one or two sentences a reviewer can act on.

import { TEAM_RULE_PREFIX } from '../../team-rules/contract';
import type { PgSite } from '../ids';
import type { RuleLayer } from '../table-types';
import type { CheckRules } from './types';

const SITE_WORDS: Record<PgSite, string> = {
	'aromatic-nitrogen': 'on an aromatic nitrogen',
	'aryl-oxygen': 'on an aryl oxygen'
};

/** A reagent that brought a class, and the other reagent of the step that decided which class. */
export type Bringer = { reagent: string; context?: { reagent: string; why: string } };
export type Origin = { reagents: Bringer[]; explicit: boolean };

/**
 * E.g. "K2CO3 with MeOH (Hydroxide, carbonate or alkoxide; carbonate in an alcohol: alkoxide
 * forms and transesterifies esters)": the reagent, the company that decided its class, the class
 * and why.
 */
function broughtBy(origin: Origin, conditionLabel: string): string {
	if (!origin.reagents.length) {
		return `The step's ${conditionLabel} conditions`;
	}
	const names = origin.reagents.map((b) =>
		b.context ? `${b.reagent} with ${b.context.reagent}` : b.reagent
	);
	const whys = [...new Set(origin.reagents.flatMap((b) => (b.context ? [b.context.why] : [])))];
	return `${list(names)} (${[conditionLabel, ...whys.map(stripStop)].join('; ')})`;
}

function list(items: string[]): string {
	return items.length <= 1
		? (items[0] ?? '')
		: `${items.slice(0, -1).join(', ')} and ${items.at(-1)}`;
}

/**
 * E.g. "TBAF (fluoride) would remove the TBS group (tert-butyldimethylsilyl ether), which this step
 * keeps. …", or "NaOMe (…) would remove the Boc group (…) on an aromatic nitrogen, which …".
 */
export function protectingGroupMessage(
	rules: CheckRules,
	pgId: string,
	condition: string,
	answer: {
		rating: 'caution' | 'labile';
		source: string;
		reason?: string;
		site?: PgSite;
		layer?: RuleLayer;
	},
	origin: Origin
): string {
	const label = rules.conditionLabel(condition);
	const verb = answer.rating === 'labile' ? 'would remove' : 'may partly remove';
	// Said only when the site decided the rating, so the reader learns why it differs from the usual.
	const where = answer.site ? ` ${SITE_WORDS[answer.site]}` : '';
	const what = `${broughtBy(origin, label)} ${verb} the ${pgId} group (${rules.protectingGroupLabel(pgId)})${where}, which this step keeps`;
	if (answer.layer === 'override' && answer.reason) {
		return teamRuleMessage(answer.reason, what, answer.source);
	}
	const why = answer.reason
		? stripStop(answer.reason)
		: `${pgId} is rated ${answer.rating} under ${label.toLowerCase()} conditions`;
	return `${what}: ${why}. Source: ${answer.source}.`;
}

/** E.g. "MeMgBr (organometallic) attacks the free ketone, which this step leaves alone: …" */
export function freeGroupMessage(
	rules: CheckRules,
	groupId: string,
	condition: string,
	rule: { rating: 'reacts' | 'caution'; reason: string; source: string; layer?: RuleLayer },
	origin: Origin
): string {
	const label = rules.conditionLabel(condition);
	const verb = rule.rating === 'reacts' ? 'attacks' : 'may attack';
	const what = `${broughtBy(origin, label)} ${verb} the free ${rules.groupLabel(groupId)}, which this step leaves alone`;
	if (rule.layer === 'override') {
		return teamRuleMessage(rule.reason, what, rule.source);
	}
	return `${what}: ${stripStop(rule.reason)}. Source: ${rule.source}.`;
}

/**
 * A standing-by group symmetry-equivalent to one the step converts: the reagent cannot tell them
 * apart, so the step is a question of selectivity (amounts, a mono-selective method), not a
 * clash, e.g. "TBSCl (…) reacts with the free primary alcohol this step converts; the other one,
 * which this step leaves alone, is the same site by symmetry: …".
 */
export function twinSiteMessage(
	rules: CheckRules,
	groupId: string,
	condition: string,
	rule: { reason: string; source: string },
	origin: Origin
): string {
	const group = rules.groupLabel(groupId);
	const by = broughtBy(origin, rules.conditionLabel(condition));
	return `${by} reacts with the free ${group} this step converts; the other free ${group}, which this step leaves alone, is the same site by symmetry, so the reagent cannot tell them apart: expect some of both to react unless the amount or the method sets one apart (common practice: one equivalent or an excess of the substrate, or a mono-selective method). Why it reacts: ${stripStop(rule.reason)}. Source: ${rule.source}.`;
}

/**
 * A message the team's override decided opens with its reason, so a reader sees at once that the
 * team, not the textbook, raised it, e.g. "team rule: our TBS ethers fall off on silica. TBAF …".
 */
function teamRuleMessage(reason: string, what: string, source: string): string {
	return `${teamRule(reason)} ${what}. Source: ${source}.`;
}

/** `team rule: <reason>.`, e.g. `teamRule('TBAF strips our TBS ethers')` → "team rule: TBAF strips our TBS ethers." */
export function teamRule(reason: string): string {
	return `${TEAM_RULE_PREFIX} ${stripStop(reason)}.`;
}

function stripStop(text: string): string {
	return text.trim().replace(/\.$/, '');
}
