import { describe, expect, it } from 'vitest';
import { loadRuleTable, type InstallMethod } from '../../src/lib/rules';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';

// The data the planner ranks and installs by (issue 12), part two: install recipes with their
// selectivity, PG drawbacks and reagent concerns (loader cross-checks and preferences:
// rules-planning-data.test.ts). Each fact's source is named beside its check.

const table = loadRuleTable();

const pgRow = (id: string) => table.protectingGroups.find((pg) => pg.id === id)!;
/** The install method whose first recipe starts with `text`, e.g. `method('TBS', 'TBSOTf')`. */
const method = (id: string, text: string) =>
	pgRow(id).install.methods.find((m) => m.reagents[0]!.startsWith(text))!;
/** The groups a recipe takes: its `takes`, else every group its PG's transforms draw. */
const takes = (id: string, m: InstallMethod) =>
	m.takes ?? pgRow(id).install.transforms.flatMap((t) => t.groups);

describe('install recipes: selectivity as data', () => {
	it('TBSCl, TBDPSCl and TIPSCl with imidazole leave a tertiary alcohol; the silyl triflate takes it — Corey et al. 1981 (from memory)', () => {
		for (const [id, chloride] of [
			['TBS', 'TBSCl'],
			['TBDPS', 'TBDPSCl'],
			['TIPS', 'TIPSCl']
		] as const) {
			expect(takes(id, method(id, chloride))).not.toContain('alcohol-tertiary');
		}
		expect(takes('TBS', method('TBS', 'TBSOTf'))).toContain('alcohol-tertiary');
	});

	it('TBDPSCl, TrCl, PivCl/pyridine and TBSCl take a primary alcohol before a secondary one — Hanessian & Lavallée 1975; Chaudhary & Hernandez 1979 (from memory)', () => {
		for (const [id, text] of [
			['TBDPS', 'TBDPSCl'],
			['Tr', 'TrCl'],
			['Piv', 'PivCl, pyridine'],
			['TBS', 'TBSCl']
		] as const) {
			expect(method(id, text).prefers, id).toEqual([
				expect.objectContaining({ group: 'alcohol-primary', over: ['alcohol-secondary'] })
			]);
		}
	});

	it('DHP, MOMCl, TMSCl, NaH/BnBr and 2,2-dimethoxypropane take every free OH and tell none apart', () => {
		for (const [id, text] of [
			['THP', 'DHP'],
			['MOM', 'MOMCl'],
			['TMS', 'TMSCl'],
			['Bn', 'NaH, BnBr'],
			['acetonide', '2,2-dimethoxypropane']
		] as const) {
			const m = method(id, text);
			expect(m.takes, id).toBeUndefined();
			expect(m.prefers, id).toEqual([]);
		}
	});

	it('every acetal and ketal recipe takes an aldehyde before a ketone — Greene’s 5th ed., ch. 4 (from memory)', () => {
		for (const id of ['dioxolane', 'dioxane', 'dimethyl-acetal', 'dithiane']) {
			for (const m of pgRow(id).install.methods) {
				expect(m.prefers, id).toEqual([
					expect.objectContaining({ group: 'aldehyde', over: ['ketone'] })
				]);
			}
		}
	});

	it('Boc2O, CbzCl and Fmoc-OSu draw only nitrogen, and acylating-amine leaves alcohols — Montalbetti & Falque 2005 (from memory)', () => {
		for (const id of ['Boc', 'Cbz', 'Fmoc']) {
			const drawn = pgRow(id).install.transforms.flatMap((t) => t.groups as readonly string[]);
			expect(
				drawn.some((g) => g.startsWith('alcohol') || g === 'phenol'),
				id
			).toBe(false);
		}
		for (const group of ['alcohol-primary', 'alcohol-secondary', 'alcohol-tertiary'] as const) {
			expect(table.reactivityOf(group, 'acylating-amine', ['Boc2O'])).toBeUndefined();
		}
	});

	it('names a source beside every recipe whose selectivity is data (`takes`, `prefers`)', () => {
		for (const pg of table.protectingGroups) {
			pg.install.methods.forEach((m) => {
				const sources = [m.note ?? '', ...m.prefers.map((p) => p.reason)].join(' ');
				if (m.takes || m.prefers.length) {
					expect(sources, `${pg.id}: ${m.reagents[0]}`).toMatch(/from memory|common practice/);
				}
			});
		}
	});

	it('offers each alternative a chemist uses where the usual recipe fails', () => {
		const all = (id: string) =>
			pgRow(id)
				.install.methods.flatMap((m) => m.reagents)
				.join(' | ');
		expect(all('Bn')).toMatch(/BnOC\(=NH\)CCl3, TfOH/);
		expect(all('Bn')).toMatch(/Ag2O, BnBr/);
		expect(all('PMB')).toMatch(/PMBOC\(=NH\)CCl3/);
		expect(all('methyl-ester')).toMatch(/TMSCHN2.*SOCl2, MeOH.*AcCl, MeOH/);
		expect(all('MOM')).toMatch(/CH2\(OMe\)2, P2O5/);
		expect(all('dioxolane')).toMatch(/TMSOCH2CH2OTMS, TMSOTf/);
		// The trichloroacetimidate recipe brings no base: it may run beside an ester or a ketone.
		const imidate = method('Bn', 'BnOC').conditions as readonly string[];
		expect(imidate.some((c) => c.startsWith('base'))).toBe(false);
	});
});

describe('install recipes read right in the check', () => {
	const rules = checkRulesFrom();
	const flagged = (step: Omit<StepToCheck, 'id'>) =>
		checkStep(rules, { id: 'step', ...step }).clashes.map(
			(c) => `${c.severity} ${c.subject} ${c.condition}`
		);
	const alanine = { substrate: 'C[C@H](N)C(=O)O', product: 'C[C@H](N)C(=O)OC' };

	it('TMSCHN2 in methanol esterifies an amino acid without touching the amine — Hashimoto, Aoyama & Shioiri 1981 (from memory)', () => {
		expect(flagged({ ...alanine, reagents: 'TMSCHN2, MeOH/toluene' })).toEqual([]);
		// MeI with K2CO3 alkylates the free amine: the rating fails without the reagent-level entry.
		expect(flagged({ ...alanine, reagents: 'MeI, K2CO3, DMF' })).toContain(
			'clash amine-primary alkylating'
		);
	});

	it('SOCl2 or AcCl in methanol is methanolic HCl: the amine is protonated, not acylated — Brenner & Huber 1953 (from memory)', () => {
		for (const reagents of ['SOCl2, MeOH', 'AcCl, MeOH']) {
			expect(table.conditionsForReagents(reagents).conditions).toEqual(['acid-strong']);
			expect(flagged({ ...alanine, reagents })).toEqual([]);
		}
	});

	it('Ag2O with BnBr neither oxidises a free alcohol nor adds to an alkene — Bouzide & Sauvé 1997 (from memory)', () => {
		const step = {
			substrate: 'OCC/C=C/CC(C)O',
			product: 'OCC/C=C/CC(C)OCc1ccccc1',
			reagents: 'Ag2O, BnBr, CH2Cl2'
		};
		const said = flagged(step);
		expect(said.filter((f) => f.endsWith('oxidant-mild') || f.includes('alkene'))).toEqual([]);
		// The other alcohol may still be benzylated: that stays a caution.
		expect(said).toContain('caution alcohol-primary alkylating');
	});
});

describe('drawbacks and concerns', () => {
	const concernsOf = (name: string) => table.reagents.find((r) => r.name === name)?.concerns ?? [];

	it('THP makes a new stereocentre; TMS and the dimethyl acetal are fragile; an acetate migrates — Greene’s 5th ed. (from memory)', () => {
		const kinds = (id: string) => pgRow(id).drawbacks.map((d) => d.kind);
		expect(kinds('THP')).toEqual(['new-stereocentre']);
		expect(kinds('TMS')).toEqual(['fragile']);
		expect(kinds('dimethyl-acetal')).toEqual(['fragile']);
		expect(kinds('Ac')).toEqual(['migrates']);
		// MOMCl's carcinogen is the reagent's, not the MOM group's (the P2O5 route avoids it).
		for (const id of ['MOM', 'BOM', 'SEM', 'MEM', 'TBS', 'dioxolane']) {
			expect(kinds(id)).toEqual([]);
		}
	});

	it('HgCl2 carries toxic-metal, the chloromethyl ethers carcinogen, TMSCHN2 highly-toxic, diazomethane explosive, t-BuLi pyrophoric (GHS classes on the SDS)', () => {
		expect(concernsOf('HgCl2')).toEqual(['toxic-metal']);
		for (const name of ['MOMCl', 'BOMCl', 'MEMCl', 'SEMCl', 'MeI', 'Me2SO4', 'CrO3', 'benzene']) {
			expect(concernsOf(name), name).toContain('carcinogen');
		}
		for (const name of ['Hg(OAc)2', 'Na/Hg', 'Pb(OAc)4', 'Bu3SnH']) {
			expect(concernsOf(name), name).toContain('toxic-metal');
		}
		for (const name of ['TMSCHN2', 'triphosgene', 'OsO4', 'TMSCN']) {
			expect(concernsOf(name), name).toContain('highly-toxic');
		}
		expect(concernsOf('diazomethane')).toContain('explosive');
		expect(concernsOf('t-BuLi')).toEqual(['pyrophoric']);
		// Routine reagents carry none.
		for (const name of ['TBSCl', 'imidazole', 'DHP', 'Boc2O', 'NaH', 'CSA']) {
			expect(concernsOf(name), name).toEqual([]);
		}
	});

	it('names the source of every concern beside it', () => {
		for (const row of table.reagents.filter((r) => r.concerns)) {
			for (const concern of row.concerns!) {
				expect(row.source, row.name).toContain(`${concern}:`);
			}
		}
	});

	it('the dithiane removal needs a reagent with a concern, the dioxolane’s does not', () => {
		const concernsOfRecipe = (text: string) =>
			table
				.conditionsForReagents(text)
				.matched.flatMap((m) => concernsOf(m.reagent) as readonly string[]);
		const removals = (id: string) => pgRow(id).remove.map((m) => m.reagents[0]!);
		expect(removals('dithiane').flatMap(concernsOfRecipe)).toContain('toxic-metal');
		expect(removals('dioxolane').flatMap(concernsOfRecipe)).toEqual([]);
	});
});
