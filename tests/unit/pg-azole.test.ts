import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem/perception-cache';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';

// Masks for an azole N–H (issue 11): N-SEM, N-Boc and N-Ts on a pyrazole. Sources: Whitten,
// Matthews & McCarthy, J. Org. Chem. 1986, 51, 1891 (N-SEM on pyrroles and azoles: stands up to
// BuLi, comes off with fluoride or acid); Hasan et al., J. Org. Chem. 1981, 46, 157 (NaOMe/MeOH
// removes Boc from an aromatic N); Joule & Mills, Heterocyclic Chemistry, 5th ed. — from memory.
// Structures are invented (OG-… scenario).

const rules = checkRulesFrom();
const check = (step: Omit<StepToCheck, 'id'>) => checkStep(rules, { id: 'step', ...step });
const on = (step: Omit<StepToCheck, 'id'>, subject: string) =>
	check(step)
		.clashes.filter((c) => c.subject === subject)
		.map((c) => c.severity);

const SEM = 'C[Si](C)(C)CCOC';
const semPyrazole = `${SEM}n1cc(cn1)C(=O)OC`;
const bocPyrazole = 'CC(C)(C)OC(=O)n1cc(cn1)C(=O)OC';

describe('protecting groups on an azole N–H', () => {
	it('perceives N-SEM and N-Boc on a pyrazole as masking the azole N–H', () => {
		for (const [smiles, pg] of [
			[semPyrazole, 'SEM'],
			[bocPyrazole, 'Boc']
		] as const) {
			const found = perceiveText(smiles).protectingGroups.filter((p) => p.id === pg);
			expect(found, smiles).toHaveLength(1);
			expect(found[0]!.masks, smiles).toBe('azole-nh');
		}
	});

	it('keeps N-SEM through LiOH ester hydrolysis, and loses it to TBAF', () => {
		const hydrolysis = { substrate: semPyrazole, product: `${SEM}n1cc(cn1)C(=O)O` };
		expect(on({ ...hydrolysis, reagents: 'LiOH, THF/H2O' }, 'SEM')).toEqual([]);
		expect(on({ ...hydrolysis, reagents: 'TBAF, THF, 65 °C' }, 'SEM')).toContain('clash');
	});

	it('flags N-Boc on a pyrazole under K2CO3/MeOH (activated carbamate on an aromatic N)', () => {
		const step = { substrate: bocPyrazole, product: 'CC(C)(C)OC(=O)n1cc(cn1)CO' };
		expect(on({ ...step, reagents: 'K2CO3, MeOH' }, 'Boc')).toContain('clash');
	});
});
