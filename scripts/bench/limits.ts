// The largest structure each chemistry endpoint accepts (STRUCTURE_LIMITS) and how long it takes,
// through the worker pool as a request would, and the pool's own overhead per call. Structures are
// peptide-like chains with free alcohols, amides and a free amine and acid (chosen because every
// group the perception knows shows up, so no search is skipped): the slow case, not a cheap one.

import { buildChemWorker } from '../build-chem-worker.js';
import { Molecule } from 'openchemlib';
import { analyzeStructure } from '../../src/lib/chem/analyze';
import { STRUCTURE_LIMITS } from '../../src/lib/chem/limits';
import { chemPoolConfig } from '../../src/lib/server/chem-pool/config';
import { closeChemistryPool, runChemistry } from '../../src/lib/server/chem-pool/pool';
import type { RouteDocument } from '../../src/lib/route/document';

buildChemWorker();

/** A chain of `units` serine-like units (6 heavy atoms each) plus 4 end atoms. */
const chain = (units: number) => `N${'C(=O)NC(CO)'.repeat(units)}C(=O)O`;
const unitsFor = (heavyAtoms: number) => Math.floor((heavyAtoms - 4) / 6);
const heavyOf = (units: number) => units * 6 + 4;

async function timed<T>(run: () => Promise<T>): Promise<number> {
	const started = performance.now();
	await run();
	return performance.now() - started;
}

/** Median of `n` runs (after the first, which also pays for caches and JIT). */
async function median(
	n: number,
	run: () => Promise<unknown>
): Promise<{ first: number; median: number }> {
	const first = await timed(run);
	const times: number[] = [];
	for (let i = 0; i < n; i++) {
		times.push(await timed(run));
	}
	times.sort((a, b) => a - b);
	return { first, median: times[Math.floor(times.length / 2)]! };
}

const ms = (value: number) => `${value.toFixed(value < 10 ? 2 : 0)} ms`;
const config = chemPoolConfig();
console.log(
	`pool: ${config.threads} thread(s), budget ${config.budgetMs} ms, page budget ${config.pageBudgetMs} ms`
);

// A warm worker first: its start-up (openchemlib load, JIT) is paid once per worker, not per call.
const startup = await timed(() => runChemistry('analyze', { text: 'CCO', options: {} }));
console.log(`worker start-up and first call: ${ms(startup)}`);

// Pool overhead: the same cached analysis in-process and through the pool.
const N = 200;
analyzeStructure('OCC(=O)O');
const direct = await timed(async () => {
	for (let i = 0; i < N; i++) {
		analyzeStructure('OCC(=O)O');
	}
});
const pooled = await timed(async () => {
	for (let i = 0; i < N; i++) {
		await runChemistry('analyze', { text: 'OCC(=O)O', options: {} });
	}
});
console.log(
	`pool overhead per call: ${ms((pooled - direct) / N)} (in-process ${ms(direct / N)}, pooled ${ms(pooled / N)}, ${N} calls)`
);

/** Perhydro-polyacene: a strip of `rings` fused cyclohexanes (ring perception's harder shape). */
function fusedLadder(rings: number): string {
	const molecule = new Molecule(0, 0);
	const top: number[] = [];
	const bottom: number[] = [];
	for (let i = 0; i <= 2 * rings; i++) {
		top.push(molecule.addAtom(6));
		bottom.push(molecule.addAtom(6));
		if (i > 0) {
			molecule.addBond(top[i - 1]!, top[i]!, 1);
			molecule.addBond(bottom[i - 1]!, bottom[i]!, 1);
		}
		if (i % 2 === 0) {
			molecule.addBond(top[i]!, bottom[i]!, 1);
		}
	}
	return molecule.toSmiles();
}
const ladderRings = Math.floor((STRUCTURE_LIMITS.maxHeavyAtoms - 2) / 4);
const ladder = fusedLadder(ladderRings);
const ladderAtoms = 2 * (2 * ladderRings + 1);

const atCap = unitsFor(STRUCTURE_LIMITS.maxHeavyAtoms);
const atDrawingCap = unitsFor(STRUCTURE_LIMITS.maxDrawingHeavyAtoms);
const rows: [string, string, { first: number; median: number }][] = [];

// Each size is new to the worker's caches on its first run; later runs of the same text hit them
// (the route map's pattern), so both are shown.
rows.push([
	'/api/analyze',
	`${heavyOf(atCap)} heavy atoms (cap ${STRUCTURE_LIMITS.maxHeavyAtoms})`,
	await median(3, () => runChemistry('analyze', { text: chain(atCap), options: {} }))
]);
rows.push([
	'/api/analyze + drawing',
	`${heavyOf(atDrawingCap)} heavy atoms (drawing cap ${STRUCTURE_LIMITS.maxDrawingHeavyAtoms})`,
	await median(3, () =>
		runChemistry('analyze', { text: chain(atDrawingCap), options: { depict: true } })
	)
]);
// The product gains a TBS group (7 heavy atoms), so the substrate leaves room for it under the cap.
const stepUnits = unitsFor(STRUCTURE_LIMITS.maxHeavyAtoms - 7);
const substrate = chain(stepUnits);
const product = substrate.replace('C(CO)', 'C(CO[Si](C)(C)C(C)(C)C)'); // one TBS ether
rows.push([
	'/api/check (one step)',
	`${heavyOf(stepUnits)} → ${heavyOf(stepUnits) + 7} heavy atoms`,
	await median(3, () =>
		runChemistry('checkSteps', {
			steps: [{ id: 's1', substrate: [substrate], product, conditions: ['acid-mild'] }]
		})
	)
]);
const route: RouteDocument = {
	name: 'Bench route at the cap',
	intermediates: [
		{ id: 'a', structure: substrate },
		{ id: 'b', structure: product }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'TBSCl, imidazole, DMF' }]
};
rows.push([
	'/api/plan (one step)',
	`${heavyOf(stepUnits)}-heavy-atom intermediates`,
	await median(1, () => runChemistry('plan', { document: route }))
]);
const nodes = Math.floor(STRUCTURE_LIMITS.maxRouteHeavyAtoms / heavyOf(atDrawingCap));
// Distinct intermediates (the page draws each distinct text once): side chains CO or CN by bits.
const variant = (units: number, bits: number) =>
	`N${Array.from({ length: units }, (_, j) => `C(=O)NC(${(bits >> j) & 1 ? 'CN' : 'CO'})`).join('')}C(=O)O`;
const pageStructures = Array.from({ length: nodes }, (_, i) => variant(atDrawingCap, i + 1));
rows.push([
	'/api/analyze, fused rings',
	`${ladderAtoms} heavy atoms, ${ladderRings} fused six-rings`,
	await median(3, () => runChemistry('analyze', { text: ladder, options: {} }))
]);
rows.push([
	'route page drawings',
	`${nodes} intermediates × ~${heavyOf(atDrawingCap)} heavy atoms (route cap ${STRUCTURE_LIMITS.maxRouteHeavyAtoms})`,
	await median(1, () =>
		runChemistry('drawRoute', { structures: pageStructures }, { budgetMs: 600_000 })
	)
]);

console.log(
	'\nendpoint                 largest accepted                                   first      warm (median)'
);
for (const [name, size, time] of rows) {
	console.log(
		`${name.padEnd(24)} ${size.padEnd(50)} ${ms(time.first).padStart(9)}  ${ms(time.median).padStart(9)}`
	);
}
console.log(
	`\nOver the caps the answer is 422 structure_too_large before parsing; over the budget, 503 chemistry_timeout.`
);
await closeChemistryPool();
