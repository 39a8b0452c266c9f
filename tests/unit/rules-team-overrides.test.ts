// A team's override layer in the rule table and in the check's words (issue 16): a row may name
// one reagent of its class; a reagent's row beats a class-wide row, which beats the defaults; a
// clash the team's row decided opens with "team rule:" and its reason.

import { describe, expect, it } from 'vitest';
import { checkStep } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import type { FreeGroupId } from '../../src/lib/rules/ids';
import { OverrideLayerError, type RuleOverridesInput } from '../../src/lib/rules/overrides';
import { loadRuleTable } from '../../src/lib/rules/table';
import type { RouteDocument } from '../../src/lib/route/document';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { TEAM_RULE_PREFIX } from '../../src/lib/team-rules/contract';
import { CLAYDEN, WUTS } from '../factories/textbook-sources';

const NAME = 'Team Kestrel';
const LIOH_REASON = 'Our primary TBS ethers fall off with LiOH in THF/H2O at 50 °C';

// Saponification of a methyl ester beside a primary TBS ether: TBS stands up to aqueous hydroxide
// (Wuts, silyl ethers: stable to aqueous base), so the step reads clean by default.
const saponify = (reagents: string) => ({
	id: 'saponify',
	substrate: 'COC(=O)CCCO[Si](C)(C)C(C)(C)C',
	product: 'OC(=O)CCCO[Si](C)(C)C(C)(C)C',
	reagents
});

const lithiumHydroxideOnly: RuleOverridesInput = {
	name: NAME,
	stability: [
		{
			protectingGroup: 'TBS',
			condition: 'base-aqueous',
			reagent: 'LiOH',
			rating: 'labile',
			reason: LIOH_REASON,
			source: 'Kestrel notebook 14, p. 31'
		}
	]
};

describe('a reagent-specific override in the rule table', () => {
	it(`leaves the default answers alone where a team has no row — ${WUTS}`, () => {
		const plain = loadRuleTable();
		const team = loadRuleTable(lithiumHydroxideOnly);
		// TBS survives aqueous base; fluoride removes it.
		for (const table of [plain, team]) {
			expect(table.stabilityOf('TBS', 'base-aqueous', ['NaOH'])).toEqual(
				plain.stabilityOf('TBS', 'base-aqueous', ['NaOH'])
			);
			expect(table.stabilityOf('TBS', 'fluoride', ['TBAF'])).toMatchObject({
				rating: 'labile',
				layer: 'default'
			});
		}
		expect(team.stabilityOf('TBS', 'base-aqueous')).toEqual(
			plain.stabilityOf('TBS', 'base-aqueous')
		);
		expect(plain.stabilityOf('TBS', 'base-aqueous').rating).toBe('stable');
	});

	it('applies to its reagent only, and the worst reagent of a step decides', () => {
		const team = loadRuleTable(lithiumHydroxideOnly);
		expect(team.stabilityOf('TBS', 'base-aqueous', ['LiOH'])).toEqual({
			rating: 'labile',
			reason: LIOH_REASON,
			source: 'Kestrel notebook 14, p. 31',
			layer: 'override'
		});
		expect(team.stabilityOf('TBS', 'base-aqueous', ['NaOH'])).toMatchObject({
			rating: 'stable',
			layer: 'default'
		});
		expect(team.stabilityOf('TBS', 'base-aqueous', ['NaOH', 'LiOH']).layer).toBe('override');
		// A class-wide question (no reagent named) is not the reagent's.
		expect(team.stabilityOf('TBS', 'base-aqueous').layer).toBe('default');
	});

	it('beats a class-wide row, which beats the defaults', () => {
		const team = loadRuleTable({
			name: NAME,
			stability: [
				{
					protectingGroup: 'TBS',
					condition: 'base-aqueous',
					rating: 'caution',
					reason: 'Slow loss over hours at 50 °C'
				},
				{
					protectingGroup: 'TBS',
					condition: 'base-aqueous',
					reagent: 'LiOH',
					rating: 'labile',
					reason: LIOH_REASON
				}
			]
		});
		expect(team.stabilityOf('TBS', 'base-aqueous', ['LiOH']).rating).toBe('labile');
		expect(team.stabilityOf('TBS', 'base-aqueous', ['NaOH'])).toMatchObject({
			rating: 'caution',
			reason: 'Slow loss over hours at 50 °C',
			layer: 'override'
		});
		expect(team.ratingsOf('TBS')['base-aqueous']).toBe('caution');
	});

	it(`silences a free group under one reagent only — ${CLAYDEN}`, () => {
		// Borohydrides reduce ketones (the default row); the team's hindered ketone survives NaBH4.
		const team = loadRuleTable({
			name: NAME,
			reactivity: [
				{
					group: 'ketone',
					condition: 'hydride-mild',
					reagent: 'NaBH4',
					rating: 'none',
					reason: 'Our hindered ketone survives NaBH4 at −78 °C'
				}
			]
		});
		expect(team.reactivityOf('ketone', 'hydride-mild', ['NaBH4'])).toBeUndefined();
		expect(team.reactivityOf('ketone', 'hydride-mild', ['NaBH4, CeCl3'])).toMatchObject({
			rating: 'reacts',
			layer: 'default'
		});
		expect(team.reactivityOf('ketone', 'hydride-mild', ['NaBH4', 'NaBH4, CeCl3'])?.rating).toBe(
			'reacts'
		);
	});

	it('keys duplicates with the reagent, and refuses a layer that repeats a cell', () => {
		const row = lithiumHydroxideOnly.stability![0]!;
		const classWide = { ...row, reagent: undefined };
		expect(() => loadRuleTable({ name: NAME, stability: [row, classWide] })).not.toThrow();
		expect(() => loadRuleTable({ name: NAME, stability: [row, row] })).toThrow(
			/duplicate stability TBS × base-aqueous × LiOH/
		);
		try {
			loadRuleTable({ name: NAME, stability: [row, row] });
		} catch (caught) {
			expect(caught).toBeInstanceOf(OverrideLayerError);
			expect((caught as OverrideLayerError).team).toBe(NAME);
		}
	});
});

describe('the check under a team layer', () => {
	it('finds the clash with the reagent and not with another of its class', () => {
		const plain = checkRulesFrom();
		const team = checkRulesFrom(loadRuleTable(lithiumHydroxideOnly));
		expect(checkStep(plain, saponify('LiOH, THF, H2O')).clashes).toEqual([]);
		expect(checkStep(team, saponify('NaOH, THF, H2O')).clashes).toEqual([]);
		const [clash, ...rest] = checkStep(team, saponify('LiOH, THF, H2O')).clashes;
		expect(rest).toEqual([]);
		expect(clash).toMatchObject({ severity: 'clash', subject: 'TBS', condition: 'base-aqueous' });
		expect(clash!.message).toBe(
			`${TEAM_RULE_PREFIX} ${LIOH_REASON}. LiOH (Hydroxide, carbonate or alkoxide) would remove the TBS group (tert-butyldimethylsilyl ether), which this step keeps. Source: Kestrel notebook 14, p. 31.`
		);
	});

	it(`words a free group the team raised as a team rule — ${CLAYDEN}`, () => {
		// A ketone reduced by NaBH4 beside an isolated alkene, which borohydride leaves alone by
		// default (NaBH4 does not touch an isolated C=C); the team raises it.
		const team = checkRulesFrom(
			loadRuleTable({
				name: NAME,
				reactivity: [
					{
						group: 'alkene',
						condition: 'hydride-mild',
						reagent: 'NaBH4',
						rating: 'caution',
						reason: 'Our electron-poor alkenes take hydride in conjugate fashion'
					}
				]
			})
		);
		const step = {
			id: 'reduce',
			substrate: 'C=CCCC(C)=O',
			product: 'C=CCCC(C)O',
			reagents: 'NaBH4, MeOH'
		};
		const [caution] = checkStep(team, step).clashes;
		expect(caution).toMatchObject({ severity: 'caution', subject: 'alkene' });
		expect(caution!.message).toMatch(
			/^team rule: Our electron-poor alkenes take hydride in conjugate fashion\. NaBH4 \(.*\) may attack the free alkene/
		);
		expect(checkStep(checkRulesFrom(), step).clashes).toEqual([]);
	});
});

describe('the planner under a team layer', () => {
	const reduce = (substrate: string, product: string): RouteDocument => ({
		name: 'Reduction',
		intermediates: [
			{ id: 'a', structure: substrate },
			{ id: 'b', structure: product }
		],
		steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'NaBH4, MeOH' }]
	});
	const raises = (group: FreeGroupId, reason: string): RuleOverridesInput => ({
		name: NAME,
		reactivity: [{ group, condition: 'hydride-mild', rating: 'reacts', reason }]
	});

	it(`masks a group only the team's rule makes a need, and says why — ${CLAYDEN}`, () => {
		// NaBH4 reduces the ketone and leaves a primary alcohol alone by default: nothing to mask.
		const route = reduce('OCCCC(C)=O', 'OCCCC(C)O');
		expect(planRouteDocument(route).plans[0]!.protections).toEqual([]);
		const reason = 'Our hydroxy ketones close to the lactol and are over-reduced';
		const [plan] = planRouteDocument(route, { layer: raises('alcohol-primary', reason) }).plans;
		expect(plan!.protections.map((p) => p.group)).toEqual(['alcohol-primary']);
		expect(plan!.rationale).toContainEqual(
			expect.stringContaining(`It is masked because of the team's override (team rule: ${reason}).`)
		);
	});

	it("says a need no PG can mask comes from the team's rule", () => {
		const answer = planRouteDocument(reduce('C=CCCC(C)=O', 'C=CCCC(C)O'), {
			layer: raises('alkene', 'Our alkenes are reduced')
		});
		expect(answer.plans).toEqual([]);
		expect(answer.unsolved?.[0]?.reason).toMatch(
			/^Step "s1" \(NaBH4, MeOH\) \(team rule: Our alkenes are reduced\) attacks the free alkene/
		);
	});
});
