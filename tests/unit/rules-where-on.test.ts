import { describe, expect, it } from 'vitest';
import { readStructure } from '../../src/lib/chem/parse';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { siteOf } from '../../src/lib/rules/check/pg-site';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { transformation } from '../../src/lib/rules/check/transformation';
import { buildRuleTable, loadRuleTable, RuleTableError } from '../../src/lib/rules';
import { DEFAULT_RULE_FILES } from '../../src/lib/rules/default-files';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { line } from '../factories/plan-routes';

// Ratings that depend on what a protecting group sits on (a PG row's `whereOn`). Sources:
// "Greene's" is Wuts, Greene's Protective Groups in Organic Synthesis (5th ed.); Hasan et al.,
// J. Org. Chem. 1981, 46, 157 (NaOMe/MeOH removes Boc from pyrroles and indoles); recalled, not
// read, hence "from memory". Structures are invented (OG-… scenario).

const rules = checkRulesFrom();
const check = (step: Omit<StepToCheck, 'id'>) => checkStep(rules, { id: 'step', ...step });
const pgClashes = (step: Omit<StepToCheck, 'id'>, pg: string) =>
	check(step).clashes.filter((c) => c.subject === pg);

const BOC = 'CC(C)(C)OC(=O)';
const TBS = 'CC(C)(C)[Si](C)(C)O';

describe('the site a PG sits on, read from the molecule', () => {
	it.each([
		[`${BOC}n1ccc2cc(CO)ccc21`, 'Boc', 'aromatic-nitrogen'],
		[`${BOC}n1cccc1C=O`, 'Boc', 'aromatic-nitrogen'],
		[`${BOC}N1CCC(CO)CC1`, 'Boc', undefined],
		[`${TBS}c1ccc(C=O)cc1`, 'TBS', 'aryl-oxygen'],
		[`${TBS}CCCC(=O)OC`, 'TBS', undefined],
		['CC(=O)Oc1ccc(CC(=O)O)cc1', 'Ac', 'aryl-oxygen'],
		['CC(=O)OCCCC(=O)O', 'Ac', undefined]
	])('%s: %s sits on %s', (smiles, pg, site) => {
		const sites = transformation([smiles], smiles).protectingGroups.filter((p) => p.id === pg);
		expect(sites).toHaveLength(1);
		expect(sites[0]!.on).toBe(site);
	});

	it('reads the site from the atom, so a pyrrole N (no free group of its own) counts', () => {
		const { molecule } = readStructure('Cn1cccc1');
		expect(siteOf(molecule, 1)).toBe('aromatic-nitrogen');
		expect(siteOf(readStructure('CCN').molecule, 2)).toBeUndefined();
		expect(siteOf(readStructure('COc1ccccc1').molecule, 1)).toBe('aryl-oxygen');
	});
});

describe('the clash check rates a PG by what it sits on', () => {
	it('NaOMe/MeOH removes Boc from an indole N — Hasan et al., J. Org. Chem. 1981, 46, 157 (from memory)', () => {
		const found = pgClashes(
			{
				substrate: `${BOC}n1ccc2cc(CC(=O)OC)ccc21`,
				product: `${BOC}n1ccc2cc(CC(=O)O)ccc21`,
				reagents: 'NaOMe, MeOH'
			},
			'Boc'
		);
		expect(found.map((c) => c.severity)).toContain('clash');
		const message = found.find((c) => c.severity === 'clash')!.message;
		expect(message).toMatch(/the Boc group \(.*\) on an aromatic nitrogen/);
		expect(message).toMatch(/activated amide/);
	});

	it("NaOMe/MeOH leaves Boc on a piperidine N — Greene's, Boc is base-stable (from memory)", () => {
		expect(
			pgClashes(
				{
					substrate: `${BOC}N1CCC(CC(=O)OC)CC1`,
					product: `${BOC}N1CCC(CC(=O)O)CC1`,
					reagents: 'NaOMe, MeOH'
				},
				'Boc'
			)
		).toEqual([]);
	});

	it("K2CO3/MeOH removes a phenolic TBS ether — Greene's, ch. 4 (from memory)", () => {
		const found = pgClashes(
			{
				substrate: `${TBS}c1ccc(COC(C)=O)cc1`,
				product: `${TBS}c1ccc(CO)cc1`,
				reagents: 'K2CO3, MeOH'
			},
			'TBS'
		);
		expect(found.map((c) => c.severity)).toEqual(['clash']);
		expect(found[0]!.message).toMatch(/on an aryl oxygen/);
	});

	it("K2CO3/MeOH leaves a primary alkyl TBS ether — Greene's, ch. 4 (from memory)", () => {
		expect(
			pgClashes(
				{
					substrate: `${TBS}CCCCOC(C)=O`,
					product: `${TBS}CCCCO`,
					reagents: 'K2CO3, MeOH'
				},
				'TBS'
			)
		).toEqual([]);
	});

	it('NaOH in hot MeOH removes Ts from an indole N but not from an alkyl amine — Bajwa et al., Tetrahedron Lett. 2006, 47, 6425 (from memory)', () => {
		const TS = 'Cc1ccc(cc1)S(=O)(=O)';
		const onIndole = pgClashes(
			{
				substrate: `${TS}n1ccc2cc(C(=O)OC)ccc21`,
				product: `${TS}n1ccc2cc(C(=O)O)ccc21`,
				reagents: 'NaOH, MeOH, reflux'
			},
			'Ts'
		);
		expect(onIndole.map((c) => c.severity)).toContain('clash');
		const onAmine = pgClashes(
			{
				substrate: `${TS}NCCC(=O)OC`,
				product: `${TS}NCCC(=O)O`,
				reagents: 'NaOH, MeOH, reflux'
			},
			'Ts'
		);
		expect(onAmine).toEqual([]);
	});

	it("hydrazine cleaves an aryl acetate; an alkyl acetate only draws a caution — Greene's, ch. 5 (from memory)", () => {
		const step = (substrate: string) =>
			pgClashes(
				{ substrate, product: substrate.replace('C=O', 'C=NN'), reagents: 'hydrazine, EtOH' },
				'Ac'
			).map((c) => c.severity);
		expect(step('CC(=O)Oc1ccc(C=O)cc1')).toContain('clash');
		expect(step('CC(=O)OCCCC=O')).not.toContain('clash');
	});

	it('says nothing of the site where the site did not decide the rating', () => {
		const found = pgClashes(
			{ substrate: `${BOC}n1ccc2ccccc21`, product: `${BOC}n1ccc2ccccc21`, reagents: 'TFA' },
			'Boc'
		);
		expect(found.map((c) => c.severity)).toEqual(['clash']);
		expect(found[0]!.message).not.toMatch(/aromatic nitrogen/);
	});
});

describe('whereOn in the rule table', () => {
	const table = loadRuleTable();

	it('applies only with a site; without one the class rating holds (the planner, the API)', () => {
		expect(table.stabilityOf('Boc', 'base-aqueous').rating).toBe('stable');
		expect(table.stabilityOf('Boc', 'base-aqueous', [], 'aromatic-nitrogen')).toMatchObject({
			rating: 'labile',
			site: 'aromatic-nitrogen'
		});
		expect(table.stabilityOf('Boc', 'base-aqueous', [], 'aryl-oxygen').rating).toBe('stable');
	});

	it('is inherited by a finer class the row does not rate, and a finer entry wins over it', () => {
		// Boc's fluoride-buffered entry (stable) wins over its fluoride entry (caution) there.
		expect(table.stabilityOf('Boc', 'fluoride', [], 'aromatic-nitrogen').rating).toBe('caution');
		expect(table.stabilityOf('Boc', 'fluoride-buffered', [], 'aromatic-nitrogen').rating).toBe(
			'stable'
		);
		expect(table.stabilityOf('Ac', 'base-aqueous-mild', [], 'aryl-oxygen').rating).toBe('labile');
	});

	it("leaves a team override on top: the team's rating wins over the site's", () => {
		const team = loadRuleTable({
			name: 'Team Kestrel',
			stability: [
				{
					protectingGroup: 'TBS',
					condition: 'base-aqueous',
					rating: 'caution',
					reason: 'our phenols are hindered'
				}
			]
		});
		expect(team.stabilityOf('TBS', 'base-aqueous', [], 'aryl-oxygen')).toMatchObject({
			rating: 'caution',
			layer: 'override'
		});
	});

	it('rejects an unknown site and a second entry for the same site and class, naming the path', () => {
		const withWhereOn = (whereOn: unknown[]) => ({
			...DEFAULT_RULE_FILES,
			protectingGroups: (DEFAULT_RULE_FILES.protectingGroups as object[]).map((row, i) =>
				i === 0 ? { ...row, whereOn } : row
			)
		});
		const entry = { condition: 'base-aqueous', rating: 'labile', reason: 'test' };
		expect(() => buildRuleTable(withWhereOn([{ site: 'aryl-sulfur', ...entry }]))).toThrow(
			RuleTableError
		);
		expect(() => buildRuleTable(withWhereOn([{ site: 'aryl-sulfur', ...entry }]))).toThrow(
			/\[0\]\.whereOn\[0\]\.site: unknown site "aryl-sulfur"/
		);
		const twice = { site: 'aryl-oxygen', ...entry };
		expect(() => buildRuleTable(withWhereOn([twice, twice]))).toThrow(
			/a second entry for aryl-oxygen base-aqueous/
		);
	});
});

describe('the planner knows the site from the group it masks', () => {
	it("does not keep a phenol under TBS or TBDPS through K2CO3/MeOH — Greene's, ch. 4 (from memory)", () => {
		// The phenol is attacked in s1 (Grignard) and s3 (acylation), so its mask sits through s2.
		const answer = planRouteDocument(
			line(
				[
					'Oc1ccc(CC=O)cc1C#C[Si](C)(C)C',
					'Oc1ccc(CC(C)O)cc1C#C[Si](C)(C)C',
					'Oc1ccc(CC(C)O)cc1C#C',
					'Oc1ccc(CC(C)OC(C)=O)cc1C#C'
				],
				['MeMgBr, THF', 'K2CO3, MeOH', 'Ac2O, Et3N, DMAP, CH2Cl2']
			)
		);
		expect(answer.plans.length).toBeGreaterThan(0);
		const phenolPgs = answer.plans.map(
			(p) => p.protections.find((x) => x.group === 'phenol')!.protectingGroup
		);
		expect(phenolPgs).not.toContain('TBS');
		expect(phenolPgs).not.toContain('TBDPS');
		expect(answer.plans[0]!.rationale.join(' ')).toMatch(/TBS rejected: .*"s2" \(K2CO3, MeOH\)/);
	});
});
