import type { PersonRef } from '../../api/answers';
import type { ReviewAction } from '../../review/contract';
import { namesList } from '../../review/history';

// The activity-feed sentences of review actions. A summary column holds 500 characters, and
// a note may hold 2000, so the note is quoted only as far as it fits.

/** The longest summary an activity event stores (the column's length). */
export const SUMMARY_MAX = 500;

function clip(text: string, max: number): string {
	return text.length <= max ? text : `${text.slice(0, Math.max(0, max - 1)).trimEnd()}…`;
}

/**
 * `sentence` followed by the quoted note as far as it fits, e.g. `Lead approved the route
 * “Diol” (version 3): “Fine as drawn.”`.
 */
function withNote(sentence: string, note: string | null): string {
	if (!note) {
		return clip(`${sentence}.`, SUMMARY_MAX);
	}
	const room = SUMMARY_MAX - sentence.length - ': “”'.length;
	if (room < 20) {
		return clip(`${sentence}.`, SUMMARY_MAX);
	}
	return `${sentence}: “${clip(note, room)}”`;
}

export type SummaryInput = {
	action: ReviewAction;
	actor: PersonRef;
	routeName: string;
	version: number;
	note: string | null;
	reviewers: PersonRef[];
};

/** The activity line of a review action, naming the people and quoting the note. */
export function activitySummary(input: SummaryInput): string {
	const { actor, routeName, version, note } = input;
	const route = `the route “${routeName}” (version ${version})`;
	switch (input.action) {
		case 'request':
			return withNote(`${actor.name} asked ${namesList(input.reviewers)} to review ${route}`, note);
		case 'approve':
			return withNote(`${actor.name} approved ${route}`, note);
		case 'request-changes':
			return withNote(`${actor.name} asked for changes to ${route}`, note);
		case 'withdraw':
			return withNote(`${actor.name} withdrew ${route} from review`, note);
	}
}

/** The activity line when a save ends an approval. */
export function returnedToDraftSummary(
	actor: PersonRef,
	routeName: string,
	approvedVersion: number,
	version: number
): string {
	return clip(
		`${actor.name}’s edit returned the route “${routeName}” to draft: version ${approvedVersion} was approved, version ${version} is not yet reviewed.`,
		SUMMARY_MAX
	);
}
