// The free groups of issue 11, part two: what the rule table says about each under the broader
// and finer classes, and that the retired id `aryl-halide` still works where a client may send it
// (perception and the boron masks: rules-new-groups-perception.test.ts). Facts are recalled from
// the sources named beside them, hence "from memory".

import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import { highlightAtoms } from '../../src/lib/chem/highlight';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { loadRuleTable, parseOverrides, RuleTableError } from '../../src/lib/rules';
import type { ConditionId, FreeGroupId } from '../../src/lib/rules/ids';

const table = loadRuleTable();
const clashesOf = (step: Omit<StepToCheck, 'id'>, rules = checkRulesFrom()) =>
	checkStep(rules, { id: 'step', ...step })
		.clashes.map((c) => `${c.severity} ${c.subject} ${c.condition}`)
		.sort();

const CLAYDEN = 'Clayden, Greeves & Warren, Organic Chemistry, 2nd ed. — from memory';
const KNOCHEL = 'Krasovskiy & Knochel, Angew. Chem. Int. Ed. 2004, 43, 3333 — from memory';
const SUZUKI = 'Miyaura & Suzuki, Chem. Rev. 1995, 95, 2457 — from memory';
const JOULE = 'Joule & Mills, Heterocyclic Chemistry, 5th ed. — from memory';

// [group, class, expected rating (undefined: no known problem), fact, source]
const FACTS: [FreeGroupId, ConditionId, 'reacts' | 'caution' | undefined, string, string][] = [
	[
		'aryl-halide-f-cl',
		'organometallic-grignard',
		undefined,
		'Ar–F and Ar–Cl are inert to Grignard reagents',
		KNOCHEL
	],
	[
		'aryl-halide-f-cl',
		'palladium-zero',
		'caution',
		'Ar–Cl couples only with special ligands',
		'Littke & Fu, Angew. Chem. Int. Ed. 2002, 41, 4176 — from memory'
	],
	[
		'aryl-halide-f-cl',
		'dissolving-metal-acid',
		undefined,
		'Fe or SnCl2 nitro reductions leave Ar–Cl',
		CLAYDEN
	],
	['aryl-halide-f-cl', 'dissolving-metal', 'reacts', 'Na/NH3 reduces aryl halides', CLAYDEN],
	['aryl-halide-f-cl', 'hydrogenation-poisoned', undefined, 'Lindlar leaves aryl halides', CLAYDEN],
	[
		'aryl-halide-br-i',
		'organometallic',
		'reacts',
		'BuLi and iPrMgCl·LiCl exchange Ar–Br and Ar–I',
		KNOCHEL
	],
	[
		'aryl-halide-br-i',
		'organometallic-grignard',
		'caution',
		'Grignards exchange Ar–I and Ar–Br only slowly',
		KNOCHEL
	],
	['aryl-halide-br-i', 'palladium-zero', 'reacts', 'Ar–Br and Ar–I couple under Pd(0)', SUZUKI],
	[
		'aryl-halide-br-i',
		'hydrogenation',
		'reacts',
		'Pd/C and H2 hydrogenolyse Ar–I readily and Ar–Br often: neither can be counted on to survive',
		CLAYDEN
	],
	[
		'alkyne-internal',
		'hydrogenation-poisoned',
		'reacts',
		'Lindlar reduces an alkyne to the cis-alkene',
		CLAYDEN
	],
	['alkyne-internal', 'metathesis', 'caution', 'Alkynes join enyne metathesis', CLAYDEN],
	['aniline', 'acylating-amine', 'reacts', 'Amide coupling reagents acylate anilines', CLAYDEN],
	['aniline', 'alkylating', 'caution', 'Anilines are N-alkylated', CLAYDEN],
	['azole-nh', 'base-strong', 'reacts', 'NaH deprotonates an azole N–H', JOULE],
	[
		'azole-nh',
		'acylating-amine',
		'caution',
		'Amine-selective acylation mostly spares the azole N–H',
		JOULE
	],
	[
		'azole-nh',
		'organometallic-grignard',
		'reacts',
		'The azole N–H consumes a Grignard reagent',
		JOULE
	],
	['azine-nitrogen', 'alkylating', 'caution', 'Pyridines are N-alkylated', JOULE],
	['azine-nitrogen', 'oxidant-strong-alkene', 'caution', 'mCPBA gives the pyridine N-oxide', JOULE],
	['azine-nitrogen', 'acid-strong', undefined, 'Protonation of a pyridine is no harm', JOULE],
	['boronic-acid', 'palladium-zero', 'reacts', 'Boronic acids are the Suzuki partner', SUZUKI],
	['boronic-acid', 'oxidant-strong', 'reacts', 'H2O2 or NaBO3 oxidise C–B to C–OH', SUZUKI],
	['boronate-ester', 'palladium-zero', 'reacts', 'Pinacol esters couple as the acid does', SUZUKI],
	['sulfonate-ester', 'nucleophile', 'reacts', 'Alkyl sulfonates are displaced', CLAYDEN],
	['sulfonate-ester', 'hydride-strong', 'reacts', 'LiAlH4 reduces alkyl sulfonates', CLAYDEN],
	['michael-acceptor', 'organometallic-soft', 'reacts', 'Cuprates add 1,4', CLAYDEN],
	['michael-acceptor', 'hydride-mild', 'caution', 'L-Selectride reduces enones 1,4', CLAYDEN],
	[
		'michael-acceptor',
		'hydrogenation',
		undefined,
		'The C=C is reported once, as the alkene',
		CLAYDEN
	],
	['vinyl-halide', 'palladium-zero', 'reacts', 'Vinyl halides couple under Pd(0)', SUZUKI],
	[
		'alcohol-allylic-benzylic',
		'oxidant-mild-allylic',
		'reacts',
		'MnO2 oxidises allylic and benzylic alcohols',
		'Fatiadi, Synthesis 1976, 65 — from memory'
	],
	[
		'alcohol-allylic-benzylic',
		'hydrogenation-poisoned',
		undefined,
		'Lindlar does not cleave benzylic C–O',
		CLAYDEN
	]
];

describe('the rule table on the new groups', () => {
	for (const [group, condition, rating, fact, source] of FACTS) {
		it(`${group} under ${condition} → ${rating ?? 'no known problem'}: ${fact} (${source})`, () => {
			expect(table.reactivityOf(group, condition)?.rating).toBe(rating);
		});
	}
	it(`a Grignard addition beside an aryl fluoride and chloride raises no clash for them (${KNOCHEL})`, () => {
		const step = {
			substrate: 'O=Cc1ccc(F)cc1Cl',
			product: 'CC(O)c1ccc(F)cc1Cl',
			conditions: ['organometallic-grignard']
		};
		expect(clashesOf(step).filter((c) => c.includes('aryl-halide'))).toEqual([]);
		// With n-BuLi (the broader class) the same step is a caution on them: ortho-lithiation.
		expect(clashesOf({ ...step, conditions: ['organometallic'] })).toContain(
			'caution aryl-halide-f-cl organometallic'
		);
	});
});

describe('the retired id aryl-halide, as a client may still send it', () => {
	it('applies a team override on aryl-halide to both halves', () => {
		const team = loadRuleTable({
			name: 'Team Kestrel',
			reactivity: [
				{
					group: 'aryl-halide',
					condition: 'palladium-zero',
					rating: 'none',
					reason: 'Our couplings use aryl boronic acids only.'
				}
			]
		});
		expect(team.reactivityOf('aryl-halide-br-i', 'palladium-zero')).toBeUndefined();
		expect(team.reactivityOf('aryl-halide-f-cl', 'palladium-zero')).toBeUndefined();
		const clashes = clashesOf(
			{
				substrate: 'Brc1ccc(cc1)C(C)=O',
				product: 'Brc1ccc(cc1)C(C)=O',
				conditions: ['palladium-zero']
			},
			checkRulesFrom(team)
		);
		expect(clashes).toEqual([]);
	});
	it('lets a row on one half win over the aryl-halide row for the same class', () => {
		const layer = parseOverrides({
			name: 'Team Kestrel',
			reactivity: [
				{
					group: 'aryl-halide',
					condition: 'nucleophile',
					rating: 'reacts',
					reason: 'Our rings are electron-poor.'
				},
				{
					group: 'aryl-halide-br-i',
					condition: 'nucleophile',
					rating: 'none',
					reason: 'Not our bromides.'
				}
			]
		});
		expect(layer.reactivity.map((r) => `${r.group} ${r.rating}`).sort()).toEqual([
			'aryl-halide-br-i none',
			'aryl-halide-f-cl reacts'
		]);
	});
	it('highlights both halves for aryl-halide in /api/analyze, and refuses it where there is none', () => {
		const smiles = 'COc1ccc(Br)cc1F';
		const perception = perceiveText(smiles);
		const halves = perception.groups
			.filter((g) => g.id.startsWith('aryl-halide-'))
			.flatMap((g) => g.atoms);
		expect(halves.length).toBe(4);
		expect(highlightAtoms('aryl-halide', perception, 10)).toEqual(
			[...new Set(halves)].sort((a, b) => a - b)
		);
		expect(() => highlightAtoms('aryl-halide', perceiveText('CCO'), 3)).toThrow(
			/Cannot highlight "aryl-halide"/
		);
	});
	it('still refuses an unknown group id, naming the valid ones with aryl-halide among them', () => {
		const bad = {
			name: 'Team Kestrel',
			reactivity: [
				{ group: 'aryl-halides', condition: 'nucleophile', rating: 'reacts', reason: 'typo' }
			]
		};
		expect(() => parseOverrides(bad)).toThrow(RuleTableError);
		expect(() => parseOverrides(bad)).toThrow(
			/unknown free group id "aryl-halides" \(valid: .*aryl-halide-br-i.*aryl-halide\b/
		);
	});
});
