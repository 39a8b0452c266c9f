import { describe, expect, it } from 'vitest';
import { loadRuleTable, type ConditionId, type FreeGroupId } from '../../src/lib/rules';
import { WUTS, CLAYDEN, COMMON } from '../factories/textbook-sources';

// Textbook facts the rule table must encode: free-group reactivity
// (protecting-group stability: rules-facts.test.ts). Each row names where the fact comes from.

const table = loadRuleTable();

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
