// The words the review bar and the history use, kept out of the components so they are tested
// once. Statuses and actions come from the contract; a new one fails the type check here.

import type { PersonRef, ReviewHistoryEntry } from '$lib/api/answers';
import type { ReviewEventAction, RouteStatus } from '$lib/review/contract';

const nameOf = (person: PersonRef | null) => person?.name ?? 'A former member';

/** "Ada", "Ada and Bo", "Ada, Bo and Cy". */
export function namesList(people: readonly PersonRef[]): string {
	const names = people.map((person) => person.name);
	return names.length <= 1
		? (names[0] ?? '')
		: `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

const HISTORY_LINES: Record<ReviewEventAction, (entry: ReviewHistoryEntry) => string> = {
	request: (entry) =>
		entry.reviewers.length
			? `${nameOf(entry.actor)} asked ${namesList(entry.reviewers)} to review`
			: `${nameOf(entry.actor)} asked for a review`,
	approve: (entry) => `${nameOf(entry.actor)} approved`,
	'request-changes': (entry) => `${nameOf(entry.actor)} asked for changes`,
	withdraw: (entry) => `${nameOf(entry.actor)} withdrew the review request`,
	'returned-to-draft': (entry) =>
		`An edit by ${nameOf(entry.actor)} returned the approved route to draft`
};

/** One history entry in words, e.g. "Ines Ferro asked Bo Lind to review". */
export const historyLine = (entry: ReviewHistoryEntry) => HISTORY_LINES[entry.action](entry);

// What became of a route that was approved and then edited (only an edit leaves `approved`).
const SINCE_APPROVAL: Record<Exclude<RouteStatus, 'approved'>, string> = {
	draft: 'is back in draft',
	'in-review': 'is in review again',
	'changes-requested': 'has had changes asked for'
};

/**
 * The approval sentence, or null for a route never approved: "Approved at version 4 by Ines
 * Ferro", or "Version 4 was approved; the route has changed since (now version 6) and is back
 * in draft".
 */
export function approvalText(review: {
	status: RouteStatus;
	version: number;
	approvedVersion: number | null;
	history: readonly ReviewHistoryEntry[];
}): string | null {
	const { status, version, approvedVersion, history } = review;
	if (approvedVersion === null) {
		return null;
	}
	if (status === 'approved') {
		const approval = history.findLast(
			(entry) => entry.action === 'approve' && entry.version === approvedVersion
		);
		return `Approved at version ${approvedVersion}${approval ? ` by ${nameOf(approval.actor)}` : ''}`;
	}
	return `Version ${approvedVersion} was approved; the route has changed since (now version ${version}) and ${SINCE_APPROVAL[status]}`;
}

/** "4 Dec, 10:12", as the activity lists write times. */
export const when = (iso: string) =>
	new Date(iso).toLocaleString('en-GB', {
		day: 'numeric',
		month: 'short',
		hour: '2-digit',
		minute: '2-digit'
	});
