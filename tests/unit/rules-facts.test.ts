import { describe, expect, it } from 'vitest';
import {
	loadRuleTable,
	type ConditionId,
	type ProtectingGroupId,
	type StabilityRating
} from '../../src/lib/rules';
import { WUTS, KOC, CLAYDEN, COMMON } from '../factories/textbook-sources';

// Textbook facts the rule table must encode: protecting-group stability
// (free-group reactivity: rules-facts-reactivity.test.ts). Each row names where the fact comes from.

const table = loadRuleTable();

type StabilityFact = [ProtectingGroupId, ConditionId, StabilityRating, string, string];
const STABILITY_FACTS: StabilityFact[] = [
	['TBS', 'fluoride', 'labile', 'TBS ethers are cleaved by fluoride (TBAF)', WUTS],
	['TMS', 'fluoride', 'labile', 'TMS ethers are cleaved by fluoride', WUTS],
	['TIPS', 'fluoride', 'labile', 'TIPS ethers are cleaved by fluoride', WUTS],
	['TBDPS', 'fluoride', 'labile', 'TBDPS ethers are cleaved by fluoride', WUTS],
	['TBS', 'acid-mild', 'labile', 'TBS ethers come off with aqueous AcOH or CSA/MeOH', WUTS],
	[
		'TBDPS',
		'acid-mild',
		'caution',
		'TBDPS is more acid-stable than TBS and survives aqueous AcOH',
		KOC
	],
	['TMS', 'base-aqueous', 'labile', 'TMS ethers are cleaved by K2CO3 in methanol', WUTS],
	[
		'TIPS',
		'base-aqueous',
		'stable',
		'TIPS is the most base-stable of the common silyl ethers',
		KOC
	],
	[
		'Bn',
		'acid-strong',
		'stable',
		'Benzyl ethers survive strong protic acid at room temperature',
		WUTS
	],
	[
		'Bn',
		'hydrogenation',
		'labile',
		'Benzyl ethers are cleaved by hydrogenolysis (H2, Pd/C)',
		CLAYDEN
	],
	[
		'Bn',
		'dissolving-metal',
		'labile',
		'Benzyl ethers are cleaved by Na/NH3 (Birch conditions)',
		WUTS
	],
	[
		'Bn',
		'oxidant-electron-transfer',
		'stable',
		'Plain benzyl ethers survive DDQ in wet CH2Cl2',
		KOC
	],
	['PMB', 'oxidant-electron-transfer', 'labile', 'PMB ethers are removed by DDQ or CAN', KOC],
	['PMB', 'acid-strong', 'labile', 'PMB ethers are cleaved by TFA', WUTS],
	['Boc', 'acid-strong', 'labile', 'Boc comes off with TFA or HCl in dioxane', CLAYDEN],
	['Boc', 'base-amine', 'stable', 'Boc survives piperidine: the Boc/Fmoc orthogonal pair', COMMON],
	['Boc', 'hydrogenation', 'stable', 'Boc survives hydrogenolysis that removes Cbz', WUTS],
	['Fmoc', 'acid-strong', 'stable', 'Fmoc survives TFA (Fmoc/tBu peptide strategy)', COMMON],
	['Cbz', 'hydrogenation', 'labile', 'Cbz is removed by H2 over Pd/C', CLAYDEN],
	['Cbz', 'base-amine', 'stable', 'Cbz survives the amine bases that remove Fmoc', WUTS],
	['Alloc', 'palladium-zero', 'labile', 'Alloc is removed by Pd(PPh3)4 with a scavenger', KOC],
	['Alloc', 'acid-strong', 'stable', 'Alloc survives TFA, so it is orthogonal to Boc', KOC],
	['Boc', 'palladium-zero', 'stable', 'Boc survives the Pd(0) conditions that remove Alloc', KOC],
	[
		'allyl-ester',
		'palladium-zero',
		'labile',
		'Allyl esters are cleaved by Pd(0) with morpholine',
		KOC
	],
	['acetonide', 'acid-mild', 'labile', 'Acetonides hydrolyse in aqueous acid', CLAYDEN],
	['acetonide', 'acid-strong', 'labile', 'Acetonides hydrolyse in aqueous acid', CLAYDEN],
	['acetonide', 'base-strong', 'stable', 'Acetals are stable to base', CLAYDEN],
	[
		'dioxolane',
		'organometallic',
		'stable',
		'A ketal masks a ketone from Grignard reagents',
		CLAYDEN
	],
	['dioxolane', 'hydride-strong', 'stable', 'A ketal masks a ketone from LiAlH4', CLAYDEN],
	['dioxolane', 'acid-mild', 'labile', 'Ketals are hydrolysed by aqueous acid', CLAYDEN],
	['THP', 'acid-mild', 'labile', 'THP ethers are removed with PPTS in warm ethanol', WUTS],
	['THP', 'base-strong', 'stable', 'THP ethers (acetals) are stable to strong base', WUTS],
	['MOM', 'organometallic', 'stable', 'MOM ethers survive organolithium reagents', WUTS],
	['MOM', 'acid-strong', 'labile', 'MOM ethers are cleaved by HCl in methanol', WUTS],
	[
		'dithiane',
		'acid-strong',
		'stable',
		'Dithianes survive the acid that hydrolyses O,O-acetals',
		KOC
	],
	['dithiane', 'soft-metal', 'labile', 'Dithianes are cleaved by HgCl2/CaCO3 or NBS', KOC],
	['Ac', 'base-aqueous', 'labile', 'Acetates are removed by K2CO3 or NaOMe in methanol', WUTS],
	['Ac', 'acid-mild', 'stable', 'Acetates survive mild acid', WUTS],
	[
		'Piv',
		'hydride-strong',
		'labile',
		'Pivalates are removed reductively with DIBAL-H or LiAlH4',
		KOC
	],
	['methyl-ester', 'base-aqueous', 'labile', 'Methyl esters are saponified by LiOH', CLAYDEN],
	['tBu-ester', 'acid-strong', 'labile', 'tert-Butyl esters are cleaved by TFA', WUTS],
	['tBu-ester', 'base-aqueous', 'stable', 'tert-Butyl esters resist saponification', WUTS],
	['Bn-ester', 'hydrogenation', 'labile', 'Benzyl esters are cleaved by hydrogenolysis', WUTS],
	[
		'Ts',
		'dissolving-metal',
		'labile',
		'Tosylamides are cleaved by Na/NH3 or sodium naphthalenide',
		WUTS
	],
	['Ts', 'acid-strong', 'stable', 'Tosylamides survive TFA', WUTS],
	[
		'phthalimide',
		'nucleophile',
		'labile',
		'Phthalimides are removed by hydrazine (Ing–Manske)',
		CLAYDEN
	],
	['TMS-alkyne', 'base-aqueous', 'labile', 'TMS-alkynes are cleaved by K2CO3 in methanol', KOC],
	['Tr', 'acid-mild', 'labile', 'Trityl ethers come off with 80% acetic acid', WUTS],
	['S-Tr', 'acid-strong', 'labile', 'S-Trityl is removed by TFA with a silane scavenger', WUTS],
	[
		'benzylidene',
		'hydrogenation',
		'labile',
		'Benzylidene acetals are cleaved by hydrogenolysis',
		WUTS
	]
];

describe('textbook facts: protecting-group stability', () => {
	for (const [pg, condition, rating, fact, source] of STABILITY_FACTS) {
		it(`${pg} is ${rating} under ${condition}: ${fact} (${source})`, () => {
			expect(table.stabilityOf(pg, condition).rating).toBe(rating);
		});
	}

	it('Fmoc is removed by piperidine, morpholine, Et2NH and DBU but sits out tertiary amines such as DIPEA (common practice of Fmoc peptide synthesis)', () => {
		for (const reagent of ['piperidine', 'morpholine', 'Et2NH', 'DBU']) {
			expect(table.stabilityOf('Fmoc', 'base-amine', [reagent]).rating, reagent).toBe('labile');
		}
		expect(table.stabilityOf('Fmoc', 'base-amine', ['DIPEA']).rating).toBe('caution');
		expect(table.stabilityOf('Fmoc', 'base-amine', ['DIPEA', 'piperidine']).rating).toBe('labile');
	});

	it('TBDPS is rated more acid-stable than TBS under mild acid (Kocienski, 3rd ed., from memory)', () => {
		const order: StabilityRating[] = ['labile', 'caution', 'stable'];
		const tbs = order.indexOf(table.stabilityOf('TBS', 'acid-mild').rating);
		const tbdps = order.indexOf(table.stabilityOf('TBDPS', 'acid-mild').rating);
		expect(tbdps).toBeGreaterThan(tbs);
	});

	it('every silyl ether is labile to fluoride, and no acetal-type group is (Wuts, 5th ed., from memory)', () => {
		for (const pg of ['TMS', 'TES', 'TBS', 'TIPS', 'TBDPS', 'TMS-alkyne'] as const) {
			expect(table.stabilityOf(pg, 'fluoride').rating, pg).toBe('labile');
		}
		for (const pg of [
			'acetonide',
			'benzylidene',
			'dioxolane',
			'dioxane',
			'dimethyl-acetal',
			'MOM',
			'THP'
		] as const) {
			expect(table.stabilityOf(pg, 'fluoride').rating, pg).toBe('stable');
		}
	});

	it('acetals are base-stable and acid-labile (Clayden, 2nd ed., from memory)', () => {
		for (const pg of [
			'acetonide',
			'benzylidene',
			'dioxolane',
			'dioxane',
			'dimethyl-acetal',
			'THP',
			'MOM'
		] as const) {
			expect(table.stabilityOf(pg, 'base-strong').rating, pg).toBe('stable');
			expect(table.stabilityOf(pg, 'base-aqueous').rating, pg).toBe('stable');
			expect(table.stabilityOf(pg, 'acid-strong').rating, pg).toBe('labile');
		}
	});
});
