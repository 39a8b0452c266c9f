import { INVALID_TRANSITION } from '../../api/errors';
import { can, ROLE_LABELS, ROLES, type Role } from '../../policy';
import {
	REVIEW_TRANSITIONS,
	ROUTE_STATUS_LABELS,
	type ReviewAction,
	type RouteStatus
} from '../../review/contract';
import { ApiFailure } from '../api';

// Why a review action was refused, in words a chemist can act on. The rules themselves are
// REVIEW_TRANSITIONS (src/lib/review/contract.ts); this module only explains them.

const ACTION_PHRASES: Record<ReviewAction, string> = {
	request: 'ask for a review',
	approve: 'approve a route',
	'request-changes': 'ask for changes',
	withdraw: 'withdraw a route from review'
};

const article = (word: string) => (/^[aeiou]/i.test(word) ? `an ${word}` : `a ${word}`);

/** The roles whose grant allows `action`, e.g. "a lead or a reviewer" for `approve`. */
export function rolesThatMay(action: ReviewAction): string {
	const roles = ROLES.filter((role) => can(role, REVIEW_TRANSITIONS[action].grant));
	return roles.map((role) => article(ROLE_LABELS[role].toLowerCase())).join(' or ');
}

/** 403 `forbidden`: the role lacks the action's grant; the message names who may. */
export function forbiddenAction(role: Role, action: ReviewAction): ApiFailure {
	return new ApiFailure(
		403,
		'forbidden',
		`As ${ROLE_LABELS[role].toLowerCase()} you cannot ${ACTION_PHRASES[action]}; only ${rolesThatMay(action)} can.`
	);
}

const APPROVED_HINT = 'edit it to return it to draft, then ask for review again.';

/** The combinations that need more than the general sentence, keyed `status action`. */
const WHY_NOT: Partial<Record<`${RouteStatus} ${ReviewAction}`, string>> = {
	'draft approve':
		'The route is a draft: nobody has asked for its review yet. Ask for a review first.',
	'draft request-changes':
		'The route is a draft: nobody has asked for its review yet, so there is nothing to answer.',
	'draft withdraw': 'The route is a draft and not in review; there is nothing to withdraw.',
	'in-review request':
		'The route is already in review. Withdraw the request first to ask other reviewers.',
	'changes-requested approve':
		'Changes were requested on this route; it must be sent for review again before it can be approved.',
	'changes-requested request-changes':
		'Changes were already requested on this route; it must be sent for review again first.',
	'approved request': `The route is approved; ${APPROVED_HINT}`,
	'approved approve': `The route is already approved; ${APPROVED_HINT}`,
	'approved request-changes': `The route is approved; ${APPROVED_HINT}`,
	'approved withdraw': `The route is approved, and an approval cannot be withdrawn; ${APPROVED_HINT}`
};

/** Why `action` does not fit a route in `status`, e.g. "The route is approved; edit it …". */
export function whyNot(status: RouteStatus, action: ReviewAction): string {
	const from = REVIEW_TRANSITIONS[action].from.map((s) => ROUTE_STATUS_LABELS[s].toLowerCase());
	return (
		WHY_NOT[`${status} ${action}`] ??
		`The route is ${ROUTE_STATUS_LABELS[status].toLowerCase()}; you can ${ACTION_PHRASES[action]} only while it is ${from.join(' or ')}.`
	);
}

/** 409 `invalid_transition`: the action does not fit the route's status; details name both. */
export function invalidTransition(status: RouteStatus, action: ReviewAction): ApiFailure {
	return new ApiFailure(409, INVALID_TRANSITION, whyNot(status, action), { status, action });
}
