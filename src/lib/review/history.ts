// A route's review history in words, and its approval as the review copy states it. Pure, so the
// route page and the printed copy say the same thing.

import type { PersonRef, ReviewHistoryEntry } from '../api/answers';
import type { ReviewEventAction, RouteStatus } from './contract';

const nameOf = (person: PersonRef | null) => person?.name ?? 'A former member';

/** "Ada", "Ada and Bo", "Ada, Bo and Cy"; '' for nobody. */
export function namesList(people: readonly PersonRef[]): string {
	const all = people.map((person) => person.name);
	return all.length > 1 ? `${all.slice(0, -1).join(', ')} and ${all.at(-1)}` : (all[0] ?? '');
}

// A Record over the contract's actions, so a new action fails the type check here.
const SENTENCES: Record<ReviewEventAction, (entry: ReviewHistoryEntry) => string> = {
	request: (e) =>
		e.reviewers.length
			? `${nameOf(e.actor)} asked ${namesList(e.reviewers)} to review version ${e.version}.`
			: `${nameOf(e.actor)} asked for a review of version ${e.version}.`,
	approve: (e) => `${nameOf(e.actor)} approved version ${e.version}.`,
	'request-changes': (e) => `${nameOf(e.actor)} asked for changes to version ${e.version}.`,
	withdraw: (e) => `${nameOf(e.actor)} withdrew the review request (version ${e.version}).`,
	'returned-to-draft': (e) =>
		`${nameOf(e.actor)} edited the approved route; it went back to draft (version ${e.version}).`
};

/** E.g. `{ action: 'approve', actor: { name: 'Reviewer' }, version: 4 }` → 'Reviewer approved version 4.' */
export function historySentence(entry: ReviewHistoryEntry): string {
	return SENTENCES[entry.action](entry);
}

/**
 * The approved version, read from a history already loaded (oldest first): the version of the
 * latest `approve`, as `approvedVersionOf` reads it from the database; null if never approved.
 */
export function approvedVersionIn(history: readonly ReviewHistoryEntry[]): number | null {
	return history.findLast((entry) => entry.action === 'approve')?.version ?? null;
}

export type Approval = {
	version: number;
	by: PersonRef | null;
	at: string | null;
	/** The route has been saved since the approved version. */
	changedSince: boolean;
};

/**
 * The approval to print: the approved version (approvedVersionOf), who gave it and when (the
 * latest `approve` of that version in the history), and whether the route has moved on, e.g.
 * version 3 approved, route now at 5 → `{ version: 3, changedSince: true, … }`. Null if never approved.
 */
export function approvalOf(
	approvedVersion: number | null,
	history: readonly ReviewHistoryEntry[],
	currentVersion: number
): Approval | null {
	if (approvedVersion === null) {
		return null;
	}
	const given = history.findLast((e) => e.action === 'approve' && e.version === approvedVersion);
	return {
		version: approvedVersion,
		by: given?.actor ?? null,
		at: given?.createdAt ?? null,
		changedSince: currentVersion !== approvedVersion
	};
}

// What became of a route that was approved and then edited (only an edit leaves `approved`).
const SINCE_APPROVAL: Record<Exclude<RouteStatus, 'approved'>, string> = {
	draft: 'is back in draft',
	'in-review': 'is in review again',
	'changes-requested': 'has had changes asked for'
};

/**
 * The approval in one sentence, or null for a route never approved: "Approved at version 4 by
 * Ines Ferro", or "Version 4 was approved; the route has changed since (now version 6) and is back
 * in draft".
 */
export function approvalText(review: {
	status: RouteStatus;
	version: number;
	approvedVersion: number | null;
	history: readonly ReviewHistoryEntry[];
}): string | null {
	const approval = approvalOf(review.approvedVersion, review.history, review.version);
	if (!approval) {
		return null;
	}
	if (review.status === 'approved') {
		return `Approved at version ${approval.version}${approval.by ? ` by ${approval.by.name}` : ''}`;
	}
	return `Version ${approval.version} was approved; the route has changed since (now version ${review.version}) and ${SINCE_APPROVAL[review.status]}`;
}

const PRINTED = new Intl.DateTimeFormat('en-GB', {
	dateStyle: 'medium',
	timeStyle: 'short',
	timeZone: 'UTC'
});

/**
 * An ISO date as Orthogon prints it (the copy, the route page, the outbox; a dash for none), in UTC so server and browser render the same text, e.g.
 * '2026-12-04T05:07:00.000Z' → '4 Dec 2026, 05:07 UTC'.
 */
export function printedDate(iso: string): string;
export function printedDate(iso: string | null): string;
export function printedDate(iso: string | null): string {
	return iso ? `${PRINTED.format(new Date(iso))} UTC` : '—';
}
