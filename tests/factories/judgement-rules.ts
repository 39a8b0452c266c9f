// A rule table with the few judgement rows the planner tests need (preferences, recipes with
// `takes`/`prefers`, drawbacks, reagent concerns), layered on the bundled files until the data of
// issue 12 lands in rules/. Each row names the source it encodes.

import { DEFAULT_RULE_FILES } from '../../src/lib/rules/default-files';
import { buildRuleTable, type RuleTable } from '../../src/lib/rules/table';

type Row = Record<string, unknown> & {
	id?: string;
	name?: string;
	group?: string;
	condition?: string;
};

const GREENE = "Wuts, Greene's Protective Groups in Organic Synthesis, 5th ed. (from memory)";

/** The bundled rule files plus the judgement rows below, as one table. */
export function judgementTable(): RuleTable {
	const files = structuredClone(DEFAULT_RULE_FILES) as unknown as Record<string, Row[]>;
	const pg = (id: string) =>
		files.protectingGroups!.find((row) => row.id === id)! as Row & {
			install: { methods: Row[] };
			drawbacks?: Row[];
		};
	const reagent = (name: string) => files.reagents!.find((row) => row.name === name)!;
	const reactivity = (group: string, condition: string) =>
		files.reactivity!.find((row) => row.group === group && row.condition === condition)!;

	files.preferences = [
		{
			groups: ['alcohol-primary', 'alcohol-secondary', 'alcohol-tertiary'],
			order: ['TBS', 'TBDPS', 'TIPS', 'Tr', 'TES', 'Bn', 'PMB', 'MOM', 'THP', 'TMS'],
			reason:
				'TBS ethers survive chromatography, mild acid and base and most organometallics, and come off cleanly with fluoride; TES and TMS are more labile, THP adds a stereocentre.',
			source: `${GREENE}; Corey & Venkateswarlu, J. Am. Chem. Soc. 1972, 94, 6190`
		},
		{
			groups: ['ketone', 'aldehyde'],
			order: ['dioxolane', 'dioxane', 'dimethyl-acetal', 'dithiane'],
			reason:
				'The ethylene ketal is the most common and robust carbonyl mask; acyclic acetals hydrolyse far more easily and dithianes need soft-metal or oxidative removal.',
			source: GREENE
		}
	];
	// Primary before secondary: the bulky silyl and trityl chlorides (Greene's; Hanessian & Lavallée 1975 for TBDPSCl).
	for (const id of ['TBDPS', 'Tr']) {
		pg(id).install.methods[0]!.prefers = [
			{
				group: 'alcohol-primary',
				over: ['alcohol-secondary'],
				reason:
					'The bulky chloride reacts with a primary alcohol much faster than with a secondary one'
			}
		];
	}
	// An aldehyde is acetalised before a ketone (Greene's, dioxolanes).
	pg('dioxolane').install.methods[0]!.prefers = [
		{
			group: 'aldehyde',
			over: ['ketone'],
			reason: 'An aldehyde forms its acetal far faster than a ketone its ketal'
		}
	];
	pg('dimethyl-acetal').drawbacks = [
		{
			kind: 'fragile',
			note: 'Acyclic acetals hydrolyse in traces of aqueous acid, far faster than dioxolanes.'
		}
	];
	// Benzyl ethers under acid for base-sensitive substrates (Iversen & Bundle, J. Chem. Soc., Chem. Commun. 1981, 1240).
	pg('Bn').install.methods.push({
		reagents: ['BnOC(=NH)CCl3, TfOH, CH2Cl2'],
		conditions: ['acid-strong', 'acid-mild', 'alkylating'],
		prefers: []
	});
	// Amino acid methyl esters by thionyl chloride in methanol: the amine stays protonated (Brenner & Huber, Helv. Chim. Acta 1953, 36, 1109).
	pg('methyl-ester').install.methods.push({
		reagents: ['SOCl2, MeOH'],
		conditions: ['acid-strong', 'acylating'],
		takes: ['carboxylic-acid'],
		prefers: []
	});
	const amine = reactivity('amine-primary', 'acylating');
	amine.reagentRatings = [
		{
			reagent: 'SOCl2',
			rating: 'none',
			reason: 'In methanol the amine is held as its hydrochloride and is not acylated.'
		}
	];
	// NaH condenses or transesterifies esters during a Williamson benzylation (Greene's, benzyl ethers).
	const ester = reactivity('ester', 'base-strong');
	ester.reagentRatings = [
		{
			reagent: 'NaH',
			rating: 'reacts',
			reason: 'NaH with a benzyl halide also condenses and transesterifies the ester.'
		}
	];
	reagent('MOMCl').concerns = ['carcinogen']; // MOMCl and its bis(chloromethyl) ether impurity (Greene's, MOM ethers)
	reagent('HgCl2').concerns = ['toxic-metal'];
	return buildRuleTable(files as never);
}
