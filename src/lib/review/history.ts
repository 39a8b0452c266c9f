// A route's review history in words, and its approval as the review copy states it. Pure, so the
// route page and the printed copy say the same thing.

import type { PersonRef, ReviewHistoryEntry } from '../api/answers';
import type { ReviewEventAction } from './contract';

const nameOf = (person: PersonRef | null) => person?.name ?? 'A former member';

function names(people: readonly PersonRef[]): string {
	const all = people.map((person) => person.name);
	return all.length > 1 ? `${all.slice(0, -1).join(', ')} and ${all.at(-1)}` : (all[0] ?? 'nobody');
}

// A Record over the contract's actions, so a new action fails the type check here.
const SENTENCES: Record<ReviewEventAction, (entry: ReviewHistoryEntry) => string> = {
	request: (e) => `${nameOf(e.actor)} asked ${names(e.reviewers)} to review version ${e.version}.`,
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

const PRINTED = new Intl.DateTimeFormat('en-GB', {
	dateStyle: 'medium',
	timeStyle: 'short',
	timeZone: 'UTC'
});

/**
 * An ISO date as the copy prints it, in UTC so server and browser render the same text, e.g.
 * '2026-12-04T05:07:00.000Z' → '4 Dec 2026, 05:07 UTC'.
 */
export function printedDate(iso: string): string {
	return `${PRINTED.format(new Date(iso))} UTC`;
}
