// The strategy planner on the routes of tests/factories/plan-routes.ts (the tests share them).
// Cold = the first plan in a fresh process; first sight = a route the warm server has never seen (every cache emptied); warm = the median of
// later runs, as when a chemist asks again after an edit elsewhere. Aims (issue 12): the 10-group
// stress route ≤ 250 ms at first sight and ≤ 50 ms warm; every textbook route ≤ 100 ms at first
// sight, which is what planning an ordinary route costs. Protected intermediates are drawn by
// editing the SMILES text (chem/smiles-splice.ts); openchemlib's Reactor, which invented 2D
// coordinates (~60 ms per 130-atom product), took most of first sight before.

import { clearPerceptionCache } from '../../src/lib/chem';
import { clearTransformationCache } from '../../src/lib/rules/check';
import { clearPlanCaches } from '../../src/lib/rules/plan';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { STRESS_ROUTE, TEXTBOOK_ROUTES } from '../../tests/factories/plan-routes';

const AIM_STRESS_FIRST_SIGHT_MS = 250;
const AIM_STRESS_WARM_MS = 50;
const AIM_TEXTBOOK_FIRST_SIGHT_MS = 100;

function timed(): { ms: number; plans: number; needs: number } {
	const start = performance.now();
	const answer = planRouteDocument(STRESS_ROUTE);
	const ms = performance.now() - start;
	return {
		ms,
		plans: answer.plans.length,
		needs: answer.plans[0]?.protections.length ?? -(answer.unsolved?.length ?? 0)
	};
}

function clearAll(): void {
	clearPerceptionCache();
	clearTransformationCache();
	clearPlanCaches();
}

const verdict = (ms: number, aim: number) =>
	ms <= aim ? `≤ ${aim} ms, met` : `aim ≤ ${aim} ms, MISSED`;

clearAll();
const cold = timed();
// First sight of a route in a warm process: every cache emptied, the code already compiled.
const fresh = Array.from({ length: 5 }, () => (clearAll(), timed().ms)).sort((a, b) => a - b)[2]!;
// Warm: a server that has planned a few routes (its code optimised by the JIT, as after the runs
// above) asked again about the same route, its caches full; the median of nine.
timed();
const warm = Array.from({ length: 9 }, timed)
	.map((r) => r.ms)
	.sort((a, b) => a - b)[4]!;
console.log(
	`plan (10 sensitive instances): cold ${cold.ms.toFixed(0)} ms, first sight ${fresh.toFixed(0)} ms (${verdict(fresh, AIM_STRESS_FIRST_SIGHT_MS)}), warm ${warm.toFixed(0)} ms (${verdict(warm, AIM_STRESS_WARM_MS)}), ${cold.plans} plans masking ${cold.needs} groups`
);

// Each textbook route at first sight, the median of three, in the order of TEXTBOOK_ROUTES. As for
// the stress route, the process has planned such routes before (the code is compiled), so each is
// planned once before the caches are emptied and it is timed.
for (const doc of TEXTBOOK_ROUTES) {
	planRouteDocument(doc);
}
const textbook = TEXTBOOK_ROUTES.map((doc) => {
	const runs = Array.from({ length: 3 }, () => {
		clearAll();
		const start = performance.now();
		planRouteDocument(doc);
		return performance.now() - start;
	});
	return runs.sort((a, b) => a - b)[1]!;
});
const slowest = Math.max(...textbook);
console.log(
	`plan (textbook routes 1–${textbook.length}, 1–3 sensitive instances): first sight ${textbook.map((ms) => ms.toFixed(0)).join(', ')} ms (slowest ${slowest.toFixed(0)} ms; ${verdict(slowest, AIM_TEXTBOOK_FIRST_SIGHT_MS)})`
);
