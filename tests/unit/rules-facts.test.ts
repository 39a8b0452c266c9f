import { describe, expect, it } from 'vitest';
import {
	loadRuleTable,
	type ConditionId,
	type FreeGroupId,
	type ProtectingGroupId,
	type StabilityRating
} from '../../src/lib/rules';

// Textbook facts the rule table must encode. Each row names where the fact comes from; the
// ratings were written from memory of these books, so the sources say so.
const WUTS =
	'Wuts, Greene’s Protective Groups in Organic Synthesis, 5th ed., reactivity charts — from memory';
const KOC = 'Kocienski, Protecting Groups, 3rd ed. — from memory';
const CLAYDEN = 'Clayden, Greeves & Warren, Organic Chemistry, 2nd ed. — from memory';
const COMMON = 'common practice';

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

type ReactivityFact = [FreeGroupId, ConditionId, 'reacts' | 'caution' | undefined, string, string];
const REACTIVITY_FACTS: ReactivityFact[] = [
	['ketone', 'organometallic', 'reacts', 'Grignard reagents add to ketones', CLAYDEN],
	['aldehyde', 'organometallic', 'reacts', 'Grignard reagents add to aldehydes', CLAYDEN],
	['ester', 'organometallic', 'reacts', 'Grignard reagents add twice to esters', CLAYDEN],
	['ketone', 'hydride-strong', 'reacts', 'LiAlH4 reduces ketones', CLAYDEN],
	['ester', 'hydride-strong', 'reacts', 'LiAlH4 reduces esters to primary alcohols', CLAYDEN],
	['aldehyde', 'hydride-mild', 'reacts', 'NaBH4 reduces aldehydes', CLAYDEN],
	['ketone', 'hydride-mild', 'reacts', 'NaBH4 reduces ketones', CLAYDEN],
	['ester', 'hydride-mild', 'caution', 'NaBH4 reduces esters only slowly', CLAYDEN],
	['diol-1,2', 'periodate', 'reacts', 'Periodate cleaves 1,2-diols', CLAYDEN],
	['diol-1,3', 'periodate', undefined, '1,3-Diols are not cleaved by periodate', CLAYDEN],
	['alkene', 'hydrogenation', 'reacts', 'Alkenes are hydrogenated over Pd/C', CLAYDEN],
	['alkyne-terminal', 'hydrogenation', 'reacts', 'Alkynes are hydrogenated', CLAYDEN],
	['azide', 'hydrogenation', 'reacts', 'Azides are reduced to amines by hydrogenation', CLAYDEN],
	[
		'nitro',
		'hydrogenation',
		'reacts',
		'Nitro groups are reduced to amines by hydrogenation',
		CLAYDEN
	],
	['alkene', 'hydride-mild', undefined, 'NaBH4 leaves isolated alkenes alone', CLAYDEN],
	['alkene', 'oxidant-strong', 'reacts', 'OsO4, ozone and peracids attack alkenes', CLAYDEN],
	['alcohol-primary', 'organometallic', 'reacts', 'O–H protons quench Grignard reagents', CLAYDEN],
	[
		'carboxylic-acid',
		'base-strong',
		'reacts',
		'Carboxylic acids are deprotonated by strong bases',
		CLAYDEN
	],
	['thiol', 'organometallic', 'reacts', 'S–H protons quench organometallics', CLAYDEN],
	[
		'amine-primary',
		'acylating',
		'reacts',
		'Amines are acylated by anhydrides and acid chlorides',
		CLAYDEN
	],
	['amine-secondary', 'alkylating', 'reacts', 'Amines are alkylated by alkyl halides', CLAYDEN],
	[
		'alcohol-primary',
		'oxidant-mild',
		'reacts',
		'Primary alcohols are oxidised to aldehydes by Swern or DMP',
		CLAYDEN
	],
	[
		'alcohol-secondary',
		'oxidant-strong',
		'reacts',
		'Secondary alcohols are oxidised to ketones by Jones reagent',
		CLAYDEN
	],
	[
		'alcohol-tertiary',
		'oxidant-mild',
		undefined,
		'Tertiary alcohols have no C–H to lose and resist oxidation',
		CLAYDEN
	],
	['epoxide', 'nucleophile', 'reacts', 'Epoxides are opened by nucleophiles', CLAYDEN],
	['epoxide', 'acid-strong', 'reacts', 'Epoxides are opened under acid', CLAYDEN],
	['epoxide', 'lewis-acid', 'reacts', 'Lewis acids open or rearrange epoxides', CLAYDEN],
	[
		'thiol',
		'oxidant-strong',
		'reacts',
		'Thiols are oxidised to disulfides and sulfonic acids',
		CLAYDEN
	],
	[
		'alkyne-terminal',
		'organometallic',
		'reacts',
		'Terminal alkynes are deprotonated by organometallics',
		CLAYDEN
	],
	[
		'aryl-halide-br-i',
		'organometallic',
		'reacts',
		'Aryl bromides undergo lithium–halogen exchange with n-BuLi',
		CLAYDEN
	],
	[
		'aryl-halide-br-i',
		'palladium-zero',
		'reacts',
		'Aryl bromides and iodides oxidatively add to Pd(0)',
		CLAYDEN
	],
	['nitrile', 'hydride-strong', 'reacts', 'LiAlH4 reduces nitriles to amines', CLAYDEN],
	['imine', 'hydride-mild', 'reacts', 'NaBH3CN reduces imines (reductive amination)', CLAYDEN],
	['sulfide', 'oxidant-strong', 'reacts', 'mCPBA oxidises sulfides to sulfoxides', CLAYDEN],
	['silyl-ether', 'fluoride', 'reacts', 'Fluoride cleaves silyl ethers', WUTS],
	['indole-nh', 'base-strong', 'reacts', 'Indole N–H is deprotonated by NaH', COMMON],
	['alkyl-halide', 'nucleophile', 'reacts', 'Alkyl halides undergo SN2 substitution', CLAYDEN],
	[
		'amine-tertiary',
		'acylating',
		'caution',
		'Tertiary amines have no N–H to acylate, but chloroformates can dealkylate them (von Braun)',
		CLAYDEN
	]
];

describe('textbook facts: free-group reactivity', () => {
	for (const [group, condition, rating, fact, source] of REACTIVITY_FACTS) {
		it(`${group} under ${condition} → ${rating ?? 'no known problem'}: ${fact} (${source})`, () => {
			expect(table.reactivityOf(group, condition)?.rating).toBe(rating);
		});
	}

	it('every O–H, N–H and S–H group quenches organometallics (Clayden, 2nd ed., from memory)', () => {
		const protic: FreeGroupId[] = [
			'alcohol-primary',
			'alcohol-secondary',
			'alcohol-tertiary',
			'phenol',
			'carboxylic-acid',
			'thiol',
			'indole-nh'
		];
		for (const group of protic) {
			expect(table.reactivityOf(group, 'organometallic')?.rating, group).toBe('reacts');
		}
		for (const group of ['amine-primary', 'amine-secondary'] as const) {
			expect(table.reactivityOf(group, 'organometallic'), group).toBeDefined();
		}
	});
});
