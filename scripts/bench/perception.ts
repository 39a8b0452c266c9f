// Perception speed: Orthogon's core (openchemlib + rules/*.json, with masks and overlap
// resolution) against RDKit-WASM running the same SMARTS (every group's reference SMARTS and
// every PG pattern) over the same 30 intermediates. RDKit only counts matches; we do more.

import { clearPerceptionCache, perceiveText, perceptionRules } from '../../src/lib/chem';
import { routeOG2031 } from '../../tests/factories/route-og2031';

const ROUNDS = 25;
const median = (values: number[]) =>
	[...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
const ms = (value: number) =>
	value < 1 ? `${(value * 1000).toFixed(0)} µs` : `${value.toFixed(1)} ms`;

const rules = perceptionRules();
const smartsSet = [
	...rules.groups.map((g) => g.smarts),
	...rules.protectingGroups.flatMap((pg) => pg.patterns)
];
const route = routeOG2031.map((step) => step.smiles);

const initRDKitModule = (await import('@rdkit/rdkit')).default;
const RDKit = await initRDKitModule();
const queries = smartsSet.map((smarts) => {
	const query = RDKit.get_qmol(smarts);
	if (!query?.is_valid()) {
		throw new Error(`RDKit cannot read ${smarts}`);
	}
	return query;
});

function oursOnce(): number {
	const start = performance.now();
	for (const smiles of route) {
		perceiveText(smiles);
	}
	return performance.now() - start;
}

function rdkitOnce(): number {
	const start = performance.now();
	for (const smiles of route) {
		const mol = RDKit.get_mol(smiles)!;
		for (const query of queries) {
			mol.get_substruct_matches(query);
		}
		mol.delete();
	}
	return performance.now() - start;
}

clearPerceptionCache();
const oursFirst = oursOnce();
const rdkitFirst = rdkitOnce();
const oursCold: number[] = [];
const rdkitCold: number[] = [];
const oursCached: number[] = [];
for (let round = 0; round < ROUNDS; round++) {
	clearPerceptionCache();
	oursCold.push(oursOnce());
	oursCached.push(oursOnce());
	rdkitCold.push(rdkitOnce());
}
queries.forEach((query) => query.delete());

const rows = [
	['first pass (JIT cold)', oursFirst, rdkitFirst],
	[`cold cache, median of ${ROUNDS}`, median(oursCold), median(rdkitCold)],
	[`route re-checked (cache by text), median of ${ROUNDS}`, median(oursCached), median(rdkitCold)]
] as const;
console.log(
	`${route.length} intermediates × ${smartsSet.length} SMARTS (${rules.groups.length} groups, ${rules.protectingGroups.length} PGs)`
);
for (const [label, ours, reference] of rows) {
	const ratio = ours / reference;
	console.log(
		`  ${label.padEnd(48)} ours ${ms(ours).padStart(9)}   RDKit ${ms(reference).padStart(9)}   ours/RDKit ${ratio < 0.01 ? ratio.toExponential(1) : ratio.toFixed(2)}`
	);
}
