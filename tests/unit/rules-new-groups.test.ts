// The free groups and boron masks of issue 11: what perception reports (and, for the near
// misses, what it must not), what the rule table says about each under the broader and finer
// classes, and that the retired id `aryl-halide` still works where a client may send it.
// Facts are recalled from the sources named beside them, hence "from memory".

import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import { highlightAtoms } from '../../src/lib/chem/highlight';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { loadRuleTable, parseOverrides, RuleTableError } from '../../src/lib/rules';
import type { ConditionId, FreeGroupId } from '../../src/lib/rules/ids';

const table = loadRuleTable();
const groupsOf = (smiles: string) => perceiveText(smiles).groups.map((g) => g.id);
const pgsOf = (smiles: string) => perceiveText(smiles).protectingGroups;
const count = (smiles: string, id: string) => groupsOf(smiles).filter((g) => g === id).length;
const clashesOf = (step: Omit<StepToCheck, 'id'>, rules = checkRulesFrom()) =>
	checkStep(rules, { id: 'step', ...step })
		.clashes.map((c) => `${c.severity} ${c.subject} ${c.condition}`)
		.sort();

const CLAYDEN = 'Clayden, Greeves & Warren, Organic Chemistry, 2nd ed. — from memory';
const KNOCHEL = 'Krasovskiy & Knochel, Angew. Chem. Int. Ed. 2004, 43, 3333 — from memory';
const SUZUKI = 'Miyaura & Suzuki, Chem. Rev. 1995, 95, 2457 — from memory';
const JOULE = 'Joule & Mills, Heterocyclic Chemistry, 5th ed. — from memory';
const BURKE = 'Gillis & Burke, J. Am. Chem. Soc. 2007, 129, 6716 — from memory';
const SUGINOME = 'Noguchi, Hojo & Suginome, J. Am. Chem. Soc. 2007, 129, 758 — from memory';

describe('perception: each new group, and the near misses', () => {
	it('splits aryl halides into F/Cl and Br/I and no longer reports aryl-halide (common practice)', () => {
		const ids = groupsOf('COc1ccc(Br)cc1F');
		expect(ids).toEqual(expect.arrayContaining(['aryl-halide-f-cl', 'aryl-halide-br-i']));
		expect(ids).not.toContain('aryl-halide');
	});
	it('does not read a methylenedioxy arene as an acetal or any acetal-type PG (common practice)', () => {
		expect(groupsOf('OCc1ccc2OCOc2c1')).not.toContain('acetal');
		expect(pgsOf('OCc1ccc2OCOc2c1')).toEqual([]);
		// A real formaldehyde acetal still is one: the MOM ether of a phenol.
		expect(pgsOf('COCOc1ccccc1').map((pg) => pg.id)).toEqual(['MOM']);
	});
	it('reports an aniline N–H as aniline only, never as an alkylamine, and not an N-aryl amide or urea', () => {
		expect(count('CNc1ccc(C)cc1', 'aniline')).toBe(1);
		expect(groupsOf('CNc1ccc(C)cc1')).not.toContain('amine-secondary');
		expect(groupsOf('Nc1ccccc1')).not.toContain('amine-primary');
		expect(count('CC(=O)Nc1ccccc1', 'aniline')).toBe(0);
		expect(count('NC(=O)Nc1ccccc1', 'aniline')).toBe(0);
	});
	it('keeps indole and carbazole as indole-nh and an azaindole, pyrazole or tetrazole as azole-nh; no N reported twice', () => {
		for (const indole of ['Cc1c[nH]c2ccccc12', 'c1ccc2c(c1)[nH]c1ccccc12']) {
			// A carbazole is an indole twice over (one instance per benzo ring, as RDKit counts it).
			expect(count(indole, 'indole-nh'), indole).toBeGreaterThan(0);
			expect(count(indole, 'azole-nh'), indole).toBe(0);
		}
		for (const azole of [
			'c1cnc2[nH]ccc2c1',
			'COC(=O)c1cc[nH]n1',
			'c1ccc(-c2nn[nH]n2)cc1',
			'c1ccc(-c2ccc[nH]2)cc1'
		]) {
			expect(count(azole, 'azole-nh'), azole).toBe(1);
			expect(count(azole, 'indole-nh'), azole).toBe(0);
		}
		// Boc on an indole N leaves no N–H (JOULE).
		expect(count('CC(C)(C)OC(=O)n1ccc2ccccc21', 'azole-nh')).toBe(0);
	});
	it('reads a 2-pyridone as neither azole, aniline nor Michael acceptor, though openchemlib keeps its C=C bonds', () => {
		const ids = groupsOf('O=c1cccc[nH]1');
		for (const id of ['azole-nh', 'aniline', 'michael-acceptor', 'azine-nitrogen']) {
			expect(ids, id).not.toContain(id);
		}
	});
	it('finds the azine N of a pyridine and a pyrimidine, not of an N-oxide or an imidazole', () => {
		expect(count('Clc1ccnc(Cl)n1', 'azine-nitrogen')).toBe(2);
		expect(count('[O-][n+]1ccccc1C', 'azine-nitrogen')).toBe(0);
		expect(count('Cn1ccnc1CO', 'azine-nitrogen')).toBe(0);
	});
	it('reports a sulfonate ester on O–SO2–C, not the Ts group on an N or a sulfate', () => {
		expect(count('FC(F)(F)S(=O)(=O)Oc1ccccc1', 'sulfonate-ester')).toBe(1);
		expect(count('Cc1ccc(cc1)S(=O)(=O)NCC1CC1', 'sulfonate-ester')).toBe(0);
		expect(count('COS(=O)(=O)OC', 'sulfonate-ester')).toBe(0);
	});
	it('reports Michael acceptors next to the alkene, and not an enaminone, vinyl ether or enamine', () => {
		expect(groupsOf('C=CC(=O)N1CCCC1')).toEqual(
			expect.arrayContaining(['michael-acceptor', 'alkene'])
		);
		for (const miss of ['CN(C)/C=C/C(=O)c1ccccc1', 'C=COCCCC', 'CC=C(C)N1CCCC1']) {
			expect(count(miss, 'michael-acceptor'), miss).toBe(0);
		}
	});
	it('reports an allylic, benzylic or propargylic OH in addition to its alcohol class; a homoallylic one is plain', () => {
		expect(groupsOf('OC/C=C/c1ccccc1')).toEqual(
			expect.arrayContaining(['alcohol-allylic-benzylic', 'alcohol-primary'])
		);
		expect(count('OCC#CCO', 'alcohol-allylic-benzylic')).toBe(2);
		for (const miss of ['OCCC=C', 'CC(C)(O)C#N', 'CC(=O)CO']) {
			expect(count(miss, 'alcohol-allylic-benzylic'), miss).toBe(0);
		}
	});
	it('reports an internal alkyne and a vinyl halide, not a silyl-capped alkyne', () => {
		expect(count('OCC#CCO', 'alkyne-internal')).toBe(1);
		expect(count('C[Si](C)(C)C#Cc1ccccc1', 'alkyne-internal')).toBe(0);
		expect(count('OC/C=C/I', 'vinyl-halide')).toBe(1);
	});
});

describe('boron masks: MIDA boronate and B(dan)', () => {
	it(`perceives a MIDA boronate in both drawings as the mask of a boronic acid (${BURKE})`, () => {
		for (const smiles of [
			'C[N+]12CC(=O)O[B-]1(c1ccc(Br)cc1)OC(=O)C2',
			'CN1CC(=O)OB(c2ccc(Br)cc2)OC(=O)C1'
		]) {
			expect(
				pgsOf(smiles).map((pg) => [pg.id, pg.masks]),
				smiles
			).toEqual([['MIDA-boronate', 'boronic-acid']]);
		}
	});
	it(`perceives B(dan) as the mask of a boronic acid, its N–H not as free anilines (${SUGINOME})`, () => {
		expect(pgsOf('Cc1ccc(cc1)B1Nc2cccc3cccc(N1)c23').map((pg) => [pg.id, pg.masks])).toEqual([
			['Bdan', 'boronic-acid']
		]);
		expect(
			clashesOf({
				substrate: 'Cc1ccc(cc1)B1Nc2cccc3cccc(N1)c23',
				product: 'Cc1ccc(cc1)B1Nc2cccc3cccc(N1)c23',
				conditions: ['acylating']
			})
		).toEqual(['caution Bdan acylating']);
	});
	it(`lets an aryl bromide couple under anhydrous Pd(0) beside a MIDA boronate, and says aqueous base removes it (${BURKE})`, () => {
		const mida = 'C[N+]12CC(=O)O[B-]1(c1ccc(Br)cc1)OC(=O)C2';
		expect(table.stabilityOf('MIDA-boronate', 'palladium-zero').rating).toBe('stable');
		expect(table.stabilityOf('MIDA-boronate', 'base-aqueous').rating).toBe('labile');
		// The bystander is the MIDA boronate; the bromide is the site that reacts.
		const product = 'C[N+]12CC(=O)O[B-]1(c1ccc(-c3ccccc3)cc1)OC(=O)C2';
		expect(clashesOf({ substrate: mida, product, conditions: ['palladium-zero'] })).toEqual([]);
		expect(
			clashesOf({ substrate: mida, product, conditions: ['palladium-zero', 'base-aqueous'] })
		).toEqual(['clash MIDA-boronate base-aqueous']);
	});
	it(`keeps B(dan) under the aqueous base of a Suzuki coupling and removes it with aqueous acid (${SUGINOME})`, () => {
		expect(table.stabilityOf('Bdan', 'base-aqueous').rating).toBe('stable');
		expect(table.stabilityOf('Bdan', 'palladium-zero').rating).toBe('stable');
		expect(table.stabilityOf('Bdan', 'acid-strong').rating).toBe('labile');
	});
});

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
