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
import type { OutboxStatus, ReviewEventAction, RouteStatus } from '$lib/review/contract';
import type { SavedConditionKind } from '$lib/library/contract';
// Erased at build time (types only): the list row is the routes service's.
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
	/** The version the latest approval was given to; absent until the route is first approved. */
	approvedVersion?: number;
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

/** A person as the review answers name them. */
export type PersonRef = { id: string; name: string };

/** One comment in `GET /api/routes/{id}/comments`; dates are ISO 8601 strings. */
export type CommentAnswer = {
	id: string;
	/** The step's id in the route document; null for a comment on the whole route. */
	stepId: string | null;
	replyTo: string | null;
	/** Null only when the author's account no longer exists. */
	author: PersonRef | null;
	/** The Markdown as written. */
	body: string;
	/** The body rendered to HTML and sanitised (no script, event handlers or javascript: links). */
	html: string;
	resolved: boolean;
	createdAt: string;
	/** When the author last changed the body; null if never. */
	editedAt: string | null;
};

/** `GET /api/routes/{id}/comments`, oldest first. */
export type CommentsAnswer = { comments: CommentAnswer[] };

/** `POST /api/routes/{id}/comments` → 201. */
export type CreatedCommentAnswer = { id: string };

/** `PATCH /api/comments/{id}`: the comment as it now stands. */
export type UpdatedCommentAnswer = CommentAnswer;

/** `POST /api/routes/{id}/review`. */
export type ReviewAnswer = { status: RouteStatus; version: number };

/** One line of a route's review history (route page, report). */
export type ReviewHistoryEntry = {
	id: string;
	action: ReviewEventAction;
	actor: PersonRef | null;
	/** The people asked to review (`request` only). */
	reviewers: PersonRef[];
	note: string | null;
	version: number;
	createdAt: string;
};

/** One message in `GET /api/outbox`; dates are ISO 8601 strings. */
export type OutboxMessageAnswer = {
	id: string;
	to: string;
	subject: string;
	text: string;
	status: OutboxStatus;
	attempts: number;
	lastError: string | null;
	createdAt: string;
	sentAt: string | null;
};

/** `GET /api/outbox` (leads): the messages of the caller's teams, newest first. */
export type OutboxAnswer = { messages: OutboxMessageAnswer[] };

/**
 * One saved condition in `GET /api/library`. `conditions`, `hazards` and `unrecognized` are read
 * on every answer from the text a step gets when it follows the entry (reagents, solvent and
 * temperature), so the library says what Orthogon could not judge, as a step's check does.
 */
export type SavedConditionAnswer = {
	id: string;
	teamId: string;
	protectingGroup: string;
	kind: SavedConditionKind;
	reagents: string;
	conditions: string[];
	/** The usual cautions of the reagents it names (check the SDS). */
	hazards: { reagent: string; note: string }[];
	/** Text Orthogon did not recognise as any reagent: its classes are not known. */
	unrecognized: string[];
	solvent: string | null;
	temperature: string | null;
	time: string | null;
	scale: string | null;
	yield: number | null;
	reference: string | null;
	notes: string | null;
	author: PersonRef | null;
	approved: boolean;
	retired: boolean;
	/** Steps in the team's routes that name this entry, counted when asked. */
	uses: number;
	createdAt: string;
	updatedAt: string;
};

/** `GET /api/library`. */
export type LibraryAnswer = { conditions: SavedConditionAnswer[] };

/** `POST /api/library` → 201. */
export type CreatedSavedConditionAnswer = { id: string };

/** One override in `GET /api/teams/{teamId}/rules`. */
export type RuleOverrideAnswer = {
	id: string;
	subject: string;
	condition: string;
	reagent?: string;
	rating: string;
	reason: string;
	source: string;
	author: PersonRef | null;
	createdAt: string;
};

/** `GET /api/teams/{teamId}/rules`. */
export type TeamRulesAnswer = { overrides: RuleOverrideAnswer[] };

/** `POST /api/library/import` → 201: rows added, rows that changed an entry (by `id`), rows equal to theirs. */
export type LibraryImportAnswer = { created: number; updated: number; unchanged: number };
