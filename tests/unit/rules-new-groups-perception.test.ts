// The free groups and boron masks of issue 11, part one: what perception reports (and, for the
// near misses, what it must not), and the boron masks in the check. The rule table on the new
// groups and the retired id `aryl-halide`: rules-new-groups.test.ts. Facts are recalled from the
// sources named beside them, hence "from memory".

import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { loadRuleTable } from '../../src/lib/rules';

const table = loadRuleTable();
const groupsOf = (smiles: string) => perceiveText(smiles).groups.map((g) => g.id);
const pgsOf = (smiles: string) => perceiveText(smiles).protectingGroups;
const count = (smiles: string, id: string) => groupsOf(smiles).filter((g) => g === id).length;
const clashesOf = (step: Omit<StepToCheck, 'id'>, rules = checkRulesFrom()) =>
	checkStep(rules, { id: 'step', ...step })
		.clashes.map((c) => `${c.severity} ${c.subject} ${c.condition}`)
		.sort();

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
