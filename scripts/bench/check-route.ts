// The clash check over a 30-step route of the invented OG-2031 scenario, end to end in one
// process: reagent text → condition classes, perception, atom mapping, ratings, messages.
// Cold = the first pass (caches empty, JIT cold); warm = the median of later passes over the
// same route, as when the route map re-checks the route after each edit.

import { clearPerceptionCache } from '../../src/lib/chem';
import { checkStep, clearTransformationCache, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import type { RuleOverridesInput } from '../../src/lib/rules/overrides';
import { loadRuleTable } from '../../src/lib/rules/table';
import { routeOG2031 } from '../../tests/factories/route-og2031';

const REAGENTS: Record<string, string> = {
	A02: 'TBSCl, imidazole, DMF',
	A03: 'DIBAL-H, CH2Cl2, -78 °C',
	A04: 'MnO2, CH2Cl2',
	A05: 'TMS-acetylene, n-BuLi, THF, -78 °C',
	A06: 'MOMCl, DIPEA, CH2Cl2',
	A07: 'K2CO3, MeOH',
	A08: 'Pd(PPh3)2Cl2, CuI, Et3N',
	A09: 'H2, Pd/C, EtOAc',
	A10: 'TBAF, THF',
	A11: 'ethyl bromoacetate, K2CO3, acetone',
	A12: 'LiOH, THF/H2O',
	A13: 'HATU, DIPEA, DMF',
	A14: 'H2, Pd/C, MeOH',
	A15: 'NaBH(OAc)3, DCE',
	A16: 'HCl in dioxane',
	B02: 'allylmagnesium bromide, CuI, THF',
	B03: 'PMB trichloroacetimidate, CSA, CH2Cl2',
	B04: 'OsO4, NaIO4, 2,6-lutidine',
	B05: 'propane-1,3-dithiol, BF3·OEt2',
	B06: 'n-BuLi, THF, -40 °C; then 2-(3-bromopropoxy)THP',
	B07: 'NBS, acetone/H2O',
	B08: 'ethylene glycol, TsOH, toluene, reflux',
	B09: 'PPTS, EtOH, 55 °C',
	B10: 'DPPA, DBU, toluene',
	B11: 'PPh3, THF/H2O; then Fmoc-OSu, NaHCO3',
	B12: 'DDQ, CH2Cl2/H2O',
	B13: 'BzCl, pyridine, DMAP',
	B14: 'HF·pyridine, THF',
	B15: 'Dess–Martin periodinane, CH2Cl2',
	B16: '20% piperidine in DMF'
};

// Two more steps extend fragment B to 30 steps in all.
const structures = [
	...routeOG2031,
	{ key: 'B15', smiles: 'O=C[C@@H](OC(=O)c1ccccc1)CC1(CCCNC(=O)OCC2c3ccccc3-c3ccccc32)OCCO1' },
	{ key: 'B16', smiles: 'O=C[C@@H](OC(=O)c1ccccc1)CC1(CCCN)OCCO1' }
];
const steps: StepToCheck[] = [];
for (let i = 1; i < structures.length; i++) {
	const [from, to] = [structures[i - 1]!, structures[i]!];
	if (from.key[0] !== to.key[0]) {
		continue;
	}
	steps.push({
		id: `${from.key}→${to.key}`,
		substrate: from.smiles,
		product: to.smiles,
		reagents: REAGENTS[to.key]!
	});
}
if (steps.length !== 30) {
	throw new Error(`expected 30 steps, built ${steps.length}`);
}

const rules = checkRulesFrom();
const runOnce = () => {
	const started = performance.now();
	const results = steps.map((step) => checkStep(rules, step));
	return { ms: performance.now() - started, results };
};

clearPerceptionCache();
clearTransformationCache();
const cold = runOnce();
const warm: number[] = [];
for (let i = 0; i < 20; i++) {
	warm.push(runOnce().ms);
}
warm.sort((a, b) => a - b);
const median = warm[Math.floor(warm.length / 2)]!;

// A cold check without the JIT advantage of the first pass: caches emptied, code already hot.
const uncached: number[] = [];
for (let i = 0; i < 5; i++) {
	clearPerceptionCache();
	clearTransformationCache();
	uncached.push(runOnce().ms);
}
uncached.sort((a, b) => a - b);

const clashes = cold.results.flatMap((r) => r.clashes);
console.log(
	`steps: ${steps.length}; clashes found: ${clashes.filter((c) => c.severity === 'clash').length}, cautions: ${clashes.filter((c) => c.severity === 'caution').length}`
);
console.log(`first pass (cold process, empty caches): ${cold.ms.toFixed(1)} ms`);
console.log(`empty caches, warm code (median of 5):   ${uncached[2]!.toFixed(1)} ms`);
console.log(`warm (median of 20 re-checks):           ${median.toFixed(2)} ms   (aim ≤ 30 ms)`);

// The same route under a team's layer (issue 16): building the layered table is paid on the
// first check after a lead changes a rule (the worker then keeps it by the layer's JSON); the
// re-check with it should cost what the defaults' does.
const layer: RuleOverridesInput = {
	name: 'Bench team',
	stability: (['TBS', 'MOM', 'PMB', 'THP', 'Bz', 'Fmoc'] as const).map((protectingGroup) => ({
		protectingGroup,
		condition: 'base-aqueous-mild' as const,
		rating: 'caution' as const,
		reason: 'Bench',
		source: 'Bench'
	})),
	reactivity: [
		{
			group: 'alcohol-primary',
			condition: 'acylating',
			rating: 'none',
			reason: 'Bench',
			source: 'Bench'
		}
	]
};
const buildStarted = performance.now();
const layered = checkRulesFrom(loadRuleTable(layer));
const buildMs = performance.now() - buildStarted;
const layeredRuns: number[] = [];
for (let i = 0; i < 20; i++) {
	const started = performance.now();
	steps.forEach((step) => checkStep(layered, step));
	layeredRuns.push(performance.now() - started);
}
layeredRuns.sort((a, b) => a - b);
console.log(
	`team layer (${layer.stability!.length + layer.reactivity!.length} overrides): table built in ${buildMs.toFixed(1)} ms; warm re-check ${layeredRuns[10]!.toFixed(2)} ms (aim ≤ 30 ms)`
);
