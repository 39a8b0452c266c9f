import { describe, expect, it } from 'vitest';
import { buildRuleTable, conditionsForReagents, type ConditionId } from '../../src/lib/rules';
import { DEFAULT_RULE_FILES } from '../../src/lib/rules/default-files';
import { RuleTableError } from '../../src/lib/rules/issues';

// Some reagents belong to a different class depending on what else is in the flask
// (rules/reagents.json `tags` and `when`; rules/README.md, "How a reagent is judged").
const ABDEL_MAGID = 'Abdel-Magid et al., J. Org. Chem. 1996, 61, 3849 — from memory';
const WUTS = 'Wuts, Greene’s Protective Groups in Organic Synthesis, 5th ed. — from memory';
const CLAYDEN = 'Clayden, Greeves & Warren, Organic Chemistry, 2nd ed., ch. 26 — from memory';
const COUPLING = 'Montalbetti & Falque, Tetrahedron 2005, 61, 10827 — from memory';
const STEGLICH = 'Höfle, Steglich & Vorbrüggen, Angew. Chem. Int. Ed. 1978, 17, 569 — from memory';

const sorted = (text: string) => [...conditionsForReagents(text).conditions].sort();
const matchOf = (text: string, reagent: string) =>
	conditionsForReagents(text).matched.find((m) => m.reagent === reagent);

describe('classifier: reagent context', () => {
	const cases: [string, ConditionId[], string][] = [
		// AcOH: dry aprotic solvent vs water, alcohol or neat.
		['AcOH, DCE', ['acid-mild-aprotic'], ABDEL_MAGID],
		['AcOH (1 equiv), CH2Cl2', ['acid-mild-aprotic'], ABDEL_MAGID],
		['AcOH, THF', ['acid-mild-aprotic'], ABDEL_MAGID],
		['NaBH(OAc)3, AcOH, DCE', ['acid-mild-aprotic', 'hydride-mild-imine'], ABDEL_MAGID],
		['AcOH, THF, H2O', ['acid-mild'], WUTS],
		['AcOH, MeOH', ['acid-mild'], WUTS],
		['AcOH', ['acid-mild'], WUTS],
		['TsOH, MeOH', ['acid-mild'], WUTS],
		['CSA, CH2Cl2', ['acid-mild'], WUTS],
		['PPTS, EtOH', ['acid-mild'], WUTS],
		['1 M HCl, THF', ['acid-mild'], WUTS],
		// Carbonates and phosphate: an alcohol makes alkoxide; aprotic solvents do not.
		['K2CO3, DMF', ['base-aqueous-mild'], CLAYDEN],
		['Cs2CO3, MeCN', ['base-aqueous-mild'], CLAYDEN],
		['K2CO3, acetone', ['base-aqueous-mild'], CLAYDEN],
		['Na2CO3, dioxane/H2O', ['base-aqueous-mild'], CLAYDEN],
		['K3PO4, toluene', ['base-aqueous-mild'], CLAYDEN],
		['K2CO3, MeOH', ['base-aqueous'], WUTS],
		['Cs2CO3, EtOH', ['base-aqueous'], WUTS],
		['K2CO3, MeOH, THF', ['base-aqueous'], WUTS],
		['K2CO3', ['base-aqueous'], WUTS],
		['LiOH, THF/H2O', ['base-aqueous'], WUTS],
		['NaOMe, MeOH', ['base-aqueous', 'nucleophile'], WUTS],
		// Acylation: amine-selective unless DMAP carries the acyl group to alcohols.
		['Boc2O, Et3N, CH2Cl2', ['acylating-amine', 'base-amine'], COUPLING],
		['Boc2O, DMAP, MeCN', ['acylating', 'base-amine'], STEGLICH],
		['HATU, DIPEA, DMF', ['acylating-amine', 'base-amine'], COUPLING],
		['EDC, HOBt, DMF', ['acylating-amine'], COUPLING],
		['DIC, HOAt', ['acylating-amine'], COUPLING],
		['T3P, pyridine, EtOAc', ['acylating-amine', 'base-amine'], COUPLING],
		['DCC, DMAP, CH2Cl2', ['acylating', 'base-amine'], STEGLICH],
		['Ac2O, pyridine', ['acylating', 'base-amine'], WUTS],
		['Ac2O, DMAP, Et3N', ['acylating', 'base-amine'], WUTS],
		['BzCl, Et3N', ['acylating', 'base-amine'], WUTS],
		// Fluoride: buffered with a carboxylic acid, TBAF is not basic.
		['TBAF, AcOH, THF', ['acid-mild-aprotic', 'fluoride-buffered'], WUTS],
		['TBAF, THF', ['fluoride'], WUTS],
		// Hydrogen over a poisoned or soluble catalyst.
		['H2, Lindlar catalyst, quinoline', ['hydrogenation-poisoned'], 'Lindlar 1952 — from memory'],
		['H2, Wilkinson’s catalyst, toluene', ['hydrogenation-homogeneous'], 'Osborn et al. 1966'],
		['H2, Pd/C, MeOH', ['hydrogenation'], WUTS],
		// A metal with a proton source is a metal/acid reduction; in ammonia it is a Birch.
		['Zn, NH4Cl, MeOH', ['dissolving-metal-acid'], 'Bellamy & Ou 1984 — from memory'],
		['Fe, HCl, EtOH', ['dissolving-metal-acid'], 'Bellamy & Ou 1984 — from memory'],
		['Na, NH3 (l)', ['dissolving-metal'], WUTS],
		// Nitroxyl co-oxidants; TBHP with an epoxidation catalyst.
		['BAIB, TEMPO, CH2Cl2', ['oxidant-mild-primary'], 'De Mico et al. 1997 — from memory'],
		['NaOCl, TEMPO, KBr, CH2Cl2/H2O', ['oxidant-mild-primary'], 'Anelli et al. 1987 — from memory'],
		['PhI(OAc)2, MeOH', ['oxidant-mild'], 'common practice'],
		['TBHP, VO(acac)2, CH2Cl2', ['oxidant-strong-alkene'], 'Sharpless & Michaelson 1973'],
		[
			'TBHP, Ti(OiPr)4, CH2Cl2',
			['lewis-acid-mild', 'oxidant-strong-alkene'],
			'Katsuki & Sharpless 1980'
		],
		['TBHP, SeO2', ['oxidant-strong'], 'common practice']
	];
	for (const [text, expected, source] of cases) {
		it(`"${text}" → ${expected.join(', ')} (${source})`, () => {
			expect(sorted(text)).toEqual([...expected].sort());
			expect(conditionsForReagents(text).unknown).toEqual([]);
		});
	}

	it('says which reagent decided and why', () => {
		expect(matchOf('K2CO3, MeOH', 'K2CO3')).toEqual({
			reagent: 'K2CO3',
			text: 'K2CO3',
			conditions: ['base-aqueous'],
			context: {
				reagent: 'MeOH',
				text: 'MeOH',
				why: expect.stringMatching(/carbonate in an alcohol: alkoxide forms/)
			}
		});
		expect(matchOf('AcOH, DCE', 'AcOH')?.context).toMatchObject({ reagent: '1,2-dichloroethane' });
		expect(matchOf('Boc2O, DMAP', 'Boc2O')?.context).toMatchObject({ reagent: 'DMAP' });
		// The row's own conditions, with no context, when no tag is present.
		expect(matchOf('K2CO3', 'K2CO3')?.context).toBeUndefined();
	});

	it('takes the first `when` entry whose tag is present: water beats a dry solvent for AcOH', () => {
		expect(matchOf('AcOH, DCE, H2O', 'AcOH')?.context).toMatchObject({ reagent: 'water' });
		expect(sorted('AcOH, DCE, H2O')).toEqual(['acid-mild']);
	});
});

describe('reagent context in the rule files', () => {
	type Raw = typeof DEFAULT_RULE_FILES;
	const problemsOf = (edit: (reagents: Record<string, unknown>[]) => void): string[] => {
		const raw = structuredClone(DEFAULT_RULE_FILES) as Raw;
		edit(raw.reagents as Record<string, unknown>[]);
		try {
			buildRuleTable(raw);
			return [];
		} catch (error) {
			if (error instanceof RuleTableError) {
				return [...error.problems];
			}
			throw error;
		}
	};
	const row = (reagents: Record<string, unknown>[], name: string) =>
		reagents.find((r) => r.name === name)!;

	it('refuses an unknown tag, naming the valid ones', () => {
		const problems = problemsOf((r) => {
			row(r, 'MeOH').tags = ['alcohool'];
		});
		expect(problems).toEqual(
			expect.arrayContaining([
				expect.stringMatching(
					/reagents\.json: \[\d+\]\.tags\[0\]: unknown reagent tag "alcohool" \(valid: .*alcohol/
				)
			])
		);
	});

	it('refuses a context no reagent can give', () => {
		const problems = problemsOf((r) => {
			row(r, 'VO(acac)2').tags = [];
			row(r, 'Ti(OiPr)4').tags = [];
		});
		expect(problems).toEqual([
			expect.stringMatching(
				/\[\d+\]\.when\[0\]\.tag: no reagent carries the tag "epoxidation-metal", so this context never applies/
			)
		]);
	});

	it('refuses a context from the reagent itself', () => {
		const problems = problemsOf((r) => {
			row(r, 'AcOH').when = [{ tag: 'carboxylic-acid', conditions: ['acid-mild'], why: 'itself' }];
		});
		expect(problems).toEqual([
			expect.stringMatching(
				/\[\d+\]\.when\[0\]\.tag: "carboxylic-acid" is one of this reagent's own tags/
			)
		]);
	});

	it('refuses a context without classes or without a reason', () => {
		const problems = problemsOf((r) => {
			row(r, 'K2CO3').when = [{ tag: 'alcohol', conditions: [] }];
		});
		expect(problems).toEqual(
			expect.arrayContaining([
				expect.stringMatching(/\[\d+\]\.when\[0\]\.conditions: /),
				expect.stringMatching(/\[\d+\]\.when\[0\]\.why: /)
			])
		);
	});
});
