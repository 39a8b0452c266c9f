// Every chemistry call the server makes off the request thread, by name. The worker runs these;
// the request side (pool.ts) only knows their types. Each is a pure function of its input.

import { analyzeStructure, type Analysis, type AnalyzeOptions } from '../../chem/analyze';
import type { StepToCheck } from '../../rules/check/types';
import { computeQuantities } from '../../quantities/compute';
import type { QuantitiesAnswer, QuantitiesRequest } from '../../quantities/contract';
import type { RouteDocument } from '../../route/document';
import { routeFromJson, routeFromSdf, routeToSdf } from '../route-sdf';
import type { RuleOverridesInput } from '../../rules/overrides';
import { checkRouteDocument, checkSteps, rulesFor } from '../services/check';
import { refusalOf } from './refusals';
import { planRouteDocument, type TeamPlanning } from '../services/plan';

export const chemistryTasks = {
	analyze: ({ text, options }: { text: string; options: AnalyzeOptions }) =>
		analyzeStructure(text, options),
	// `layer`: the team's rule overrides (services/team-rules-layer.ts); `savedConditions`: the
	// team's approved library entries (services/planning-library.ts). Both plain JSON; the layered
	// table is built here in the worker.
	checkSteps: ({ steps, layer }: { steps: StepToCheck[]; layer?: RuleOverridesInput }) =>
		checkSteps(steps, rulesFor(layer).rules),
	checkRoute: ({ document, layer }: { document: RouteDocument; layer?: RuleOverridesInput }) =>
		checkRouteDocument(document, rulesFor(layer).rules),
	plan: ({ document, ...team }: { document: RouteDocument } & TeamPlanning) =>
		planRouteDocument(document, team),
	importSdf: ({ text, name }: { text: string; name: string }) => routeFromSdf(text, name),
	importJson: ({ text, name }: { text: string; name: string }) => routeFromJson(text, name),
	exportSdf: ({ document }: { document: RouteDocument }) => routeToSdf(document),
	/** What to weigh out and the water a trap should collect (issue 14). */
	quantities: ({ request }: { request: QuantitiesRequest }) => computeQuantities(request),
	/** Several steps' quantities in one call (the review copy); a refused step carries its message. */
	quantitiesOfSteps: ({ requests }: { requests: QuantitiesRequest[] }) =>
		requests.map((request): QuantitiesAnswer | { refused: string } => {
			try {
				return computeQuantities(request);
			} catch (caught) {
				const refusal = refusalOf(caught);
				if (!refusal) {
					throw caught;
				}
				return { refused: refusal.message };
			}
		}),
	/** Drawings of a route's intermediates; an unreadable one is left out (its node asks itself). */
	drawRoute: ({ structures }: { structures: string[] }) => {
		const analyses: Record<string, Analysis> = {};
		for (const structure of structures) {
			if (analyses[structure]) {
				continue;
			}
			try {
				analyses[structure] = analyzeStructure(structure, { depict: true });
			} catch {
				// The node asks /api/analyze itself and shows that answer's message.
			}
		}
		return analyses;
	}
};

export type ChemistryTasks = typeof chemistryTasks;
export type ChemistryTask = keyof ChemistryTasks;
export type TaskInput<K extends ChemistryTask> = Parameters<ChemistryTasks[K]>[0];
export type TaskOutput<K extends ChemistryTask> = ReturnType<ChemistryTasks[K]>;
