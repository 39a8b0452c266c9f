// The review contract (issue 15), shared by the server, the API and the browser: route statuses,
// review actions and which status each may start from, outbox statuses, and the request bodies.
// Pure data and zod: no server or framework imports, so pages can read it too.

import { z } from 'zod';
import type { Action } from '../policy';
import { FIELD_LIMITS } from '../schemas/limits';
import { text } from '../schemas/text';

export const ROUTE_STATUSES = ['draft', 'in-review', 'changes-requested', 'approved'] as const;
export type RouteStatus = (typeof ROUTE_STATUSES)[number];

export const ROUTE_STATUS_LABELS: Record<RouteStatus, string> = {
	draft: 'Draft',
	'in-review': 'In review',
	'changes-requested': 'Changes requested',
	approved: 'Approved'
};

export const REVIEW_ACTIONS = ['request', 'approve', 'request-changes', 'withdraw'] as const;
export type ReviewAction = (typeof REVIEW_ACTIONS)[number];

/** What the review history records: the four actions, and an edit that ended an approval. */
export const REVIEW_EVENT_ACTIONS = [...REVIEW_ACTIONS, 'returned-to-draft'] as const;
export type ReviewEventAction = (typeof REVIEW_EVENT_ACTIONS)[number];

/**
 * Each action: the statuses it may start from, the status it leads to, and the grant it needs
 * (src/lib/policy.ts). Asking for review again after changes were requested is allowed; an
 * approved route goes back to draft by being edited, not by an action.
 */
export const REVIEW_TRANSITIONS: Record<
	ReviewAction,
	{ from: readonly RouteStatus[]; to: RouteStatus; grant: Action }
> = {
	request: { from: ['draft', 'changes-requested'], to: 'in-review', grant: 'route.edit' },
	approve: { from: ['in-review'], to: 'approved', grant: 'route.review' },
	'request-changes': { from: ['in-review'], to: 'changes-requested', grant: 'route.review' },
	withdraw: { from: ['in-review', 'changes-requested'], to: 'draft', grant: 'route.edit' }
};

/** Whether `action` may be taken on a route in `status` (roles aside). */
export function canTransition(status: RouteStatus, action: ReviewAction): boolean {
	return REVIEW_TRANSITIONS[action].from.includes(status);
}

/** The roles that may be asked to review: the grant `route.review`. */
export const REVIEWER_GRANT: Action = 'route.review';

export const OUTBOX_STATUSES = ['queued', 'sending', 'sent', 'failed'] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

// From text(), so a NUL is refused with a message rather than stored (PostgreSQL would 500).
const commentBody = text()
	.trim()
	.min(1, 'Write something first.')
	.max(FIELD_LIMITS.commentBody.max, `At most ${FIELD_LIMITS.commentBody.max} characters.`);

/** `POST /api/routes/{id}/comments`. */
export const newCommentBody = z.object({
	body: commentBody,
	stepId: z.string().min(1).max(64).optional(),
	replyTo: z.uuid().optional()
});
export type NewCommentBody = z.infer<typeof newCommentBody>;

/** `PATCH /api/comments/{id}`: at least one of the two. */
export const commentPatchBody = z
	.object({ body: commentBody.optional(), resolved: z.boolean().optional() })
	.refine((patch) => patch.body !== undefined || patch.resolved !== undefined, {
		message: 'Send a new body, or resolved: true or false.'
	});
export type CommentPatchBody = z.infer<typeof commentPatchBody>;

/** `POST /api/routes/{id}/review`. `version`, when sent, must still be the stored version. */
export const reviewBody = z.object({
	action: z.enum(REVIEW_ACTIONS),
	reviewers: z.array(z.email()).max(50).optional(),
	note: text()
		.trim()
		.max(FIELD_LIMITS.reviewNote.max, `At most ${FIELD_LIMITS.reviewNote.max} characters.`)
		.optional(),
	version: z.number().int().positive().optional()
});
export type ReviewBody = z.infer<typeof reviewBody>;
