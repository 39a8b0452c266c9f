// The JSON API's answers, one type per endpoint, in the one place both sides read: each
// `+server.ts` checks its body against its type (`satisfies`), and the browser reads the same
// type, so a field the server adds (a step's `error`) cannot be lost by a copy in the client.
// Types only: importing this module ships no server or chemistry code to the browser.

import type { Analysis } from '$lib/chem/analyze';
import type { GroupPattern } from '$lib/chem/patterns';
import type { QuantitiesAnswer } from '$lib/quantities/contract';
import type { RouteDocument } from '$lib/route/document';
import type { Azeotrope } from '$lib/rules/azeotropes';
import type { CheckAnswer, Clash, StepCheck } from '$lib/rules/check/types';
import type { CheckedPlanAnswer } from '$lib/rules/plan';
import type { StabilityRating } from '$lib/rules/ids';
import type { Condition, ProtectingGroupConditions } from '$lib/rules/schemas';
// Erased at build time (types only): the status vocabulary is the database model's, the list
// row the routes service's.
import type { RouteStatus } from '$lib/server/db/models/route';
import type { RouteSummary } from '$lib/server/services/routes';

/** `POST /api/analyze`. */
export type AnalyzeAnswer = Analysis;
/** `POST /api/check` and `GET /api/routes/{id}/check`. */
export type { CheckAnswer, Clash, StepCheck };
/** `POST /api/quantities` (src/lib/quantities/contract.ts). */
export type { QuantitiesAnswer };
/** `GET /api/azeotropes`: the rows of rules/azeotropes.json. */
export type AzeotropesAnswer = { azeotropes: readonly Azeotrope[] };
/** `POST /api/plan` and `POST /api/routes/{id}/plan`. */
export type PlanAnswer = CheckedPlanAnswer;

/** `GET /api/routes/{id}`. */
export type RouteAnswer = {
	id: string;
	projectId: string;
	name: string;
	status: RouteStatus;
	version: number;
	document: RouteDocument;
};

/** `PUT /api/routes/{id}`: the version now stored. */
export type SavedRouteAnswer = { version: number };

/** `POST /api/projects/{projectId}/routes`. */
export type CreatedRouteAnswer = { id: string; version: number };

/** `POST /api/projects/{projectId}/routes/import`. */
export type ImportedRouteAnswer = { id: string };

/** `POST /api/routes/{id}/plan/{rank}/save`: the new route made from the plan. */
export type SavedPlanAnswer = { id: string; version: number; name: string };

/** `GET /api/projects/{projectId}/routes`. */
export type RouteListAnswer = {
	routes: Pick<RouteSummary, 'id' | 'name' | 'status' | 'version' | 'updatedAt'>[];
};

/**
 * `GET /api/rules`: the rule table as loaded, every class rating spelled out per PG. A PG row's
 * `label` is not in its schema (rows are read loosely), so readers check it is there.
 */
export type RulesAnswer = {
	conditions: readonly Condition[];
	protectingGroups: readonly (ProtectingGroupConditions & {
		stability: Record<string, StabilityRating>;
	})[];
	groups: readonly GroupPattern[];
};
