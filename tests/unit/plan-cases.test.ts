// The planner case corpus of issue 12: textbook situations as linear routes, each with the first
// choice an experienced chemist makes, what must never be offered, and the source beside it
// (tests/corpus/plans/README.md). A case is read three ways before it is judged: RDKit reads
// every structure, Orthogon perceives every group the case names, and the clash check reads every
// step's reagents, so a case cannot pass because a group or a reagent went unseen.

import { beforeAll, describe, expect, it } from 'vitest';
import type { MainModule } from '@rdkit/rdkit';
import { perceiveText } from '../../src/lib/chem';
import { planRoute, type Plan, type PlanAnswer } from '../../src/lib/rules/plan';
import { checkRouteDocument, defaultCheckRules } from '../../src/lib/server/services/check';
import { firstClash } from '../../src/lib/server/services/plan';
import {
	loadPlanCases,
	namedGroups,
	planCaseSchema,
	type LoadedCase,
	type PlanCase
} from '../corpus/plans/cases';
import { line } from '../factories/plan-routes';
import { rdkit } from '../reference/rdkit';

const cases = loadPlanCases();
// "Never offered" looks past the five plans the API shows, so a bad PG cannot hide at rank six.
const PLANS_LOOKED_AT = 20;
/** The themes of issue 12's list; each file holds at least three cases. */
const THEMES = [
	'alcohols',
	'carbonyls',
	'amines',
	'acids',
	'diols',
	'selectivity',
	'cautions',
	'orthogonal'
];

let RDKit: MainModule;
beforeAll(async () => {
	RDKit = await rdkit();
});

const routeOf = (c: PlanCase) => line(c.route.structures, c.route.reagents, `OG case ${c.id}`);

describe('the planner case corpus', () => {
	it('has at least 30 cases, each id once', () => {
		expect(cases.length).toBeGreaterThanOrEqual(30);
		const ids = cases.map((c) => c.id);
		expect(ids.filter((id, i) => ids.indexOf(id) !== i)).toEqual([]);
	});
	it('has every theme of the issue, each with at least three cases', () => {
		const thin = THEMES.filter(
			(theme) => cases.filter((c) => c.file === `${theme}.json`).length < 3
		);
		expect(thin).toEqual([]);
	});
	it('says what must never be offered in at least a third of its cases', () => {
		const withNever = cases.filter((c) => c.expect.never || c.expect.neverFirst).length;
		expect(withNever).toBeGreaterThanOrEqual(cases.length / 3);
	});
});

describe('how a planner answer is read against a case', () => {
	const base: PlanCase = {
		id: 'reading',
		title: 'a case only for reading answers',
		route: { structures: ['CC(=O)CCO', 'CC(C)(O)CCO'], reagents: ['MeMgBr, THF'] },
		expect: {},
		source: 'common practice',
		why: 'checks how expectations are read'
	};
	const plan = (rank: number, ...pgs: [string, string, string?][]): Plan => ({
		rank,
		score: rank,
		protections: pgs.map(([group, protectingGroup, reagents]) => ({
			group,
			atoms: [],
			intermediate: 'i0',
			protectingGroup,
			install: { before: 's1', reagents: reagents ?? '', conditions: [] },
			removal: { after: 'end', reagents: '', conditions: [] }
		})),
		route: line(base.route.structures, base.route.reagents),
		addedSteps: pgs.length * 2,
		rationale: [`plan ${rank}`]
	});
	const read = (expect: PlanCase['expect'], answer: PlanAnswer) =>
		judge({ ...base, expect }, answer);

	it('holds plan 1 to the first choice, and any of a list will do', () => {
		const answer = {
			plans: [plan(1, ['alcohol-primary', 'THP']), plan(2, ['alcohol-primary', 'TBS'])]
		};
		expect(read({ firstChoice: { 'alcohol-primary': ['TBS', 'TBDPS'] } }, answer)).toEqual([
			'plan 1 puts THP on the alcohol-primary; expected TBS or TBDPS'
		]);
		expect(read({ firstChoice: { 'alcohol-primary': ['THP', 'TBS'] } }, answer)).toEqual([]);
	});
	it('finds a never-offered PG below the first five plans', () => {
		const plans = [1, 2, 3, 4, 5, 6].map((rank) =>
			plan(rank, ['ketone', rank === 6 ? 'dithiane' : 'dioxolane'])
		);
		expect(read({ never: ['dithiane'] }, { plans })).toEqual(['dithiane is offered (plan 6)']);
	});
	it('reads a recipe on every plan that uses the PG', () => {
		const answer = {
			plans: [
				plan(1, ['alcohol-primary', 'TBS']),
				plan(2, ['alcohol-primary', 'Bn', 'NaH, BnBr, DMF'])
			]
		};
		expect(read({ installs: { Bn: { not: 'NaH' } } }, answer)).toEqual([
			'plan 2 puts Bn on with "NaH, BnBr, DMF"'
		]);
	});
	it('tells unsolved, nothing to mask and a missing mask apart', () => {
		const unsolved = {
			plans: [],
			unsolved: [{ group: 'ketone', atoms: [], reason: 'no PG fits' }]
		};
		const nothing = { plans: [plan(1)] };
		expect(read({ unsolved: true }, unsolved)).toEqual([]);
		expect(read({ unsolved: true }, nothing)).toEqual(['expected unsolved, a plan came back']);
		expect(read({ nothingToMask: true }, unsolved)).toEqual([
			'expected a plan, the answer is unsolved'
		]);
		expect(read({ nothingToMask: true }, nothing)).toEqual([]);
		expect(read({ masks: ['amine-primary'] }, nothing)).toEqual([
			'plan 1 does not mask the amine-primary'
		]);
	});
	it('refuses a case with an unknown PG id, a broken pattern or no expectation', () => {
		const parse = (expect: unknown) => planCaseSchema.safeParse({ ...base, expect }).success;
		expect(parse({ never: ['TBS'] })).toBe(true);
		expect(parse({ never: ['OG-silyl'] })).toBe(false);
		expect(parse({ rationaleMatches: '(unclosed' })).toBe(false);
		expect(parse({})).toBe(false);
	});
});

describe.each(cases)('$id', (c) => {
	it('has structures RDKit reads', () => {
		const unread = c.route.structures.filter((smiles) => {
			const mol = RDKit.get_mol(smiles);
			const ok = mol?.is_valid() ?? false;
			mol?.delete();
			return !ok;
		});
		expect(unread, `case ${c.id}`).toEqual([]);
	});

	it('names only groups Orthogon perceives on the route', () => {
		const seen = new Set(
			c.route.structures.flatMap((s) => perceiveText(s).groups.map((g) => g.id))
		);
		expect(
			namedGroups(c.expect).filter((group) => !seen.has(group)),
			`case ${c.id}`
		).toEqual([]);
	});

	it('has steps the check reads in full', () => {
		const problems = checkRouteDocument(routeOf(c)).flatMap((step) => [
			...(step.error ? [`${step.id}: ${step.error.message}`] : []),
			...step.unrecognized.map((text) => `${step.id}: "${text}" not recognised`)
		]);
		expect(problems, `case ${c.id}`).toEqual([]);
	});

	it(`is planned as a chemist would — ${c.source}`, () => {
		const answer = planRoute(routeOf(c), {
			verify: firstClash,
			rules: defaultCheckRules(),
			plans: PLANS_LOOKED_AT
		});
		const failures = judge(c, answer);
		expect(failures, failures.length ? report(c, failures, answer) : '').toEqual([]);
	});
});

/** Where the planner's answer disagrees with the case, one line each. */
function judge(c: PlanCase, answer: PlanAnswer): string[] {
	const { expect: want } = c;
	const failures: string[] = [];
	if (want.unsolved) {
		if (answer.plans.length || !answer.unsolved?.length) {
			failures.push('expected unsolved, a plan came back');
		}
		return failures;
	}
	if (answer.unsolved?.length || !answer.plans.length) {
		return ['expected a plan, the answer is unsolved'];
	}
	const first = answer.plans[0]!;
	const pgsOf = (group: string) =>
		first.protections.filter((p) => p.group === group).map((p) => p.protectingGroup);
	if (want.nothingToMask && first.protections.length) {
		failures.push('expected nothing to mask, plan 1 masks something');
	}
	for (const group of want.masks ?? []) {
		if (!pgsOf(group).length) {
			failures.push(`plan 1 does not mask the ${group}`);
		}
	}
	for (const [group, allowed] of Object.entries(want.firstChoice ?? {})) {
		const any = ([] as string[]).concat(allowed);
		const used = pgsOf(group);
		if (!used.length) {
			failures.push(`plan 1 does not mask the ${group}; expected ${any.join(' or ')}`);
		}
		for (const pg of used.filter((pg) => !any.includes(pg))) {
			failures.push(`plan 1 puts ${pg} on the ${group}; expected ${any.join(' or ')}`);
		}
	}
	const firstPgs = first.protections.map((p) => p.protectingGroup);
	for (const pg of want.neverFirst ?? []) {
		if (firstPgs.includes(pg)) {
			failures.push(`plan 1 uses ${pg}`);
		}
	}
	for (const pg of want.never ?? []) {
		const ranks = answer.plans
			.filter((p) => p.protections.some((x) => x.protectingGroup === pg))
			.map((p) => p.rank);
		if (ranks.length) {
			failures.push(`${pg} is offered (plan ${ranks.join(', ')})`);
		}
	}
	if (want.rationaleMatches && !new RegExp(want.rationaleMatches).test(first.rationale.join(' '))) {
		failures.push(`plan 1's rationale does not match /${want.rationaleMatches}/`);
	}
	for (const [pg, recipe] of Object.entries(want.installs ?? {})) {
		for (const plan of answer.plans) {
			for (const p of plan.protections.filter((x) => x.protectingGroup === pg)) {
				const reagents = p.install.reagents;
				if (recipe.matches && !new RegExp(recipe.matches).test(reagents)) {
					failures.push(
						`plan ${plan.rank} puts ${pg} on with "${reagents}", not /${recipe.matches}/`
					);
				}
				if (recipe.not && new RegExp(recipe.not).test(reagents)) {
					failures.push(`plan ${plan.rank} puts ${pg} on with "${reagents}"`);
				}
			}
		}
	}
	return failures;
}

/** The case, its failures and what the planner answered, for the lead to reconcile. */
function report(c: LoadedCase, failures: string[], answer: PlanAnswer): string {
	const plans = answer.plans.slice(0, 5).map((plan) => {
		const pgs = plan.protections
			.map((p) => `${p.group}→${p.protectingGroup} (${p.install.reagents})`)
			.join('; ');
		return `  plan ${plan.rank} [score ${plan.score}]: ${pgs || 'nothing masked'}\n    ${plan.rationale.slice(0, 2).join('\n    ')}`;
	});
	const unsolved = (answer.unsolved ?? []).map((u) => `  unsolved ${u.group}: ${u.reason}`);
	return [
		`case ${c.id} (${c.file}) — ${c.title}`,
		`source: ${c.source}`,
		...failures.map((f) => `  ${f}`),
		'the planner said:',
		...plans,
		...unsolved
	].join('\n');
}
