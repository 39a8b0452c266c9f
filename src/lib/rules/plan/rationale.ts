// Why one plan ranks above another, in one sentence from the first cost tier where they differ
// (added steps, drawbacks, cautions, preference, harshness; see search.ts `scoreOf`), e.g.
// "Plan 1 comes first: plan 2's THP has a drawback: THP puts a new stereocentre …".

import type { CheckRules } from '../check/types';
import { PROTECTING_GROUP_IDS } from '../ids';
import type { RuleTable } from '../table';
import type { Choice } from './cost';
import type { Drawback, Need, Plan } from './types';

/**
 * The plans with the ranking said: plan 1's rationale opens with why it beat plan 2, each later
 * plan's ends with why it ranks below the plan just above it.
 */
export function withRanking(
	table: RuleTable,
	rules: CheckRules,
	needs: Need[],
	plans: Plan[],
	choices: Choice[]
): Plan[] {
	return plans.map((plan, k) => {
		if (k === 0) {
			if (plans.length < 2) {
				return plan;
			}
			return {
				...plan,
				rationale: [
					`Plan 1 comes first: ${why(table, rules, needs, choices[0]!, choices[1]!, { upper: 'it', lower: 'plan 2', lowers: "plan 2's" })}`,
					...plan.rationale
				]
			};
		}
		const above = `plan ${k}`;
		const reason = why(table, rules, needs, choices[k - 1]!, choices[k]!, {
			upper: above,
			lower: 'it',
			lowers: 'its'
		});
		return { ...plan, rationale: [...plan.rationale, `Ranked below ${above}: ${reason}`] };
	});
}

type Names = { upper: string; lower: string; lowers: string };

/** One sentence on why `upper` costs less than `lower`, worded for the plan it is said of. */
function why(
	table: RuleTable,
	rules: CheckRules,
	needs: Need[],
	upper: Choice,
	lower: Choice,
	names: Names
): string {
	const count = (n: number, what: string) => `${n} ${what}${n === 1 ? '' : 's'}`;
	// The plan the sentence is said of ("it") comes first: "it adds 4 steps where plan 1 adds 2".
	const contrast = (say: (name: string, choice: Choice) => string) =>
		names.upper === 'it'
			? `${say('it', upper)} where ${say(names.lower, lower)}`
			: `${say('it', lower)} where ${say(names.upper, upper)}`;
	if (upper.addedSteps !== lower.addedSteps) {
		return `${contrast((name, c) => `${name} adds ${count(c.addedSteps, 'step')}`)}.`;
	}
	if (upper.drawbacks !== lower.drawbacks) {
		const extra = extraDrawbacks(upper, lower)[0];
		if (extra) {
			return `${names.lowers} ${extra.pg} has a drawback: ${lowerFirst(extra.drawback.note)}${/[.!?]$/.test(extra.drawback.note) ? '' : '.'}`;
		}
		return `${contrast((name, c) => `${name} carries ${count(c.drawbacks, 'drawback')}`)}.`;
	}
	if (upper.cautions !== lower.cautions) {
		return `${contrast((name, c) => `${name} leaves ${count(c.cautions, 'caution rating')} to watch`)}.`;
	}
	if (upper.preference !== lower.preference) {
		const i = needs.findIndex(
			(_, x) => upper.options[x]!.preference < lower.options[x]!.preference
		);
		const row =
			i >= 0
				? table.preferences.find((r) => (r.groups as readonly string[]).includes(needs[i]!.group))
				: undefined;
		if (row) {
			const [better, worse] = [upper.options[i]!.pg, lower.options[i]!.pg];
			return `${better} is preferred to ${worse} for ${article(rules.groupLabel(needs[i]!.group))}: ${lowerFirst(row.reason)}${/[.!?]$/.test(row.reason) ? '' : '.'}`;
		}
		return `its protecting groups are the more usual choices (rules/preferences.json).`;
	}
	if (upper.harshness !== lower.harshness) {
		return names.upper === 'it'
			? `its added steps use milder conditions than ${names.lower}'s.`
			: `its added steps use harsher conditions than ${names.upper}'s.`;
	}
	return `it costs the same as ${names.upper === 'it' ? names.lower : names.upper} on every count (steps, drawbacks, cautions, preference, harshness); either will do.`;
}

/** Drawbacks of `lower`'s options that `upper` does not carry for the same need, with their PG. */
function extraDrawbacks(upper: Choice, lower: Choice): { pg: string; drawback: Drawback }[] {
	return lower.options.flatMap((option, i) => {
		const mine = new Set(upper.options[i]!.drawbacks.map((d) => `${d.kind}\u0001${d.note}`));
		return option.drawbacks
			.filter((d) => !mine.has(`${d.kind}\u0001${d.note}`))
			.map((drawback) => ({ pg: option.pg, drawback }));
	});
}

/** Mid-sentence case for an ordinary first word ("A cyclic …" → "a cyclic …"); a PG name ("Boc is …") keeps its case. */
const lowerFirst = (text: string) =>
	/^[A-Z][a-z]/.test(text) && !PROTECTING_GROUP_IDS.some((id) => text.startsWith(`${id} `))
		? text[0]!.toLowerCase() + text.slice(1)
		: text;
const article = (label: string) => `${/^[aeiou]/i.test(label) ? 'an' : 'a'} ${label}`;
