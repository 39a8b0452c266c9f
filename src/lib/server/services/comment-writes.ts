import type { Transaction } from 'sequelize';
import { can, ROLE_LABELS, type Role } from '../../policy';
import type { CommentPatchBody, NewCommentBody } from '../../review/contract';
import { stepLabeller } from '../../route/step-names';
import type { SessionUser } from '../../types';
import { ApiFailure } from '../api';
import { Comment, dbReady, User, type Project, type Route } from '../db';
import { queueMail } from '../mail/outbox';
import { recordActivity } from './activity';
import { newCommentMails } from './comment-mails';
import { routeDocument } from './routes';

// Writing comments. Each change, its activity event and the mails it causes commit in one
// transaction, so a comment never exists without its notices and a failed request leaves nothing.
// Reading is in comments.ts.

/** How the activity feed and the mails name where a comment sits, from the stored route. */
async function placeNamer(route: Route) {
	const document = await routeDocument(route);
	const label = stepLabeller(document);
	const stepIds = new Set(document.steps.map((step) => step.id));
	return {
		hasStep: (stepId: string) => stepIds.has(stepId),
		stepLabel: (stepId: string | null) => (stepId === null ? null : label(stepId)),
		/** E.g. `on step "s2" (TBAF, THF) of “Route A”`, or `on “Route A”`. */
		on: (stepId: string | null) =>
			stepId === null ? `on “${route.name}”` : `on ${label(stepId)} of “${route.name}”`
	};
}

/** The step a new comment belongs to: a reply takes the step of the comment it answers. */
async function stepOfNewComment(
	route: Route,
	body: NewCommentBody,
	hasStep: (stepId: string) => boolean
): Promise<string | null> {
	if (body.stepId !== undefined && !hasStep(body.stepId)) {
		throw new ApiFailure(
			422,
			'unknown_step',
			`The route “${route.name}” has no step “${body.stepId}”. Comment on one of its steps, or on the whole route.`
		);
	}
	if (body.replyTo === undefined) {
		return body.stepId ?? null;
	}
	const answered = await Comment.findOne({ where: { id: body.replyTo, routeId: route.id } });
	if (!answered) {
		throw new ApiFailure(
			422,
			'unknown_comment',
			`The comment ${body.replyTo} you reply to is not on the route “${route.name}”.`
		);
	}
	if (body.stepId !== undefined && body.stepId !== answered.stepKey) {
		throw new ApiFailure(
			422,
			'unknown_step',
			`A reply belongs to the step of the comment it answers (${answered.stepKey === null ? 'the whole route' : `step “${answered.stepKey}”`}), not to step “${body.stepId}”. Leave stepId out.`
		);
	}
	return answered.stepKey;
}

/**
 * Adds a comment to a route (or one of its steps, or as a reply), records it in the activity feed
 * and queues the mails for the route's author, the thread and anyone mentioned, all or nothing.
 */
export async function addComment(
	actor: SessionUser,
	route: Route,
	project: Project,
	body: NewCommentBody
): Promise<Comment> {
	await dbReady();
	const place = await placeNamer(route);
	const stepKey = await stepOfNewComment(route, body, place.hasStep);
	return Comment.sequelize!.transaction(async (transaction) => {
		const comment = await Comment.create(
			{
				routeId: route.id,
				stepKey,
				replyToId: body.replyTo ?? null,
				authorId: actor.id,
				body: body.body,
				resolvedById: null,
				editedAt: null
			},
			{ transaction }
		);
		await recordActivity(
			{
				teamId: project.teamId,
				projectId: project.id,
				routeId: route.id,
				actorId: actor.id,
				kind: 'comment.added',
				summary: `${actor.name} ${body.replyTo ? 'replied' : 'commented'} ${place.on(stepKey)}.`,
				details: { commentId: comment.id, stepId: stepKey, replyTo: body.replyTo ?? null }
			},
			transaction
		);
		const mails = await newCommentMails(
			{
				comment,
				route,
				teamId: project.teamId,
				author: actor,
				stepLabel: place.stepLabel(stepKey)
			},
			transaction
		);
		await queueMail(mails, transaction);
		return comment;
	});
}

function forbidden(message: string): never {
	throw new ApiFailure(403, 'forbidden', message);
}

type Change = { kind: 'comment.edited' | 'comment.resolved' | 'comment.reopened'; verb: string };

/** What the patch changes, refusing (403) what this caller may not change; nothing is written. */
function changesOf(actor: SessionUser, role: Role, comment: Comment, patch: CommentPatchBody) {
	if (!can(role, 'route.comment')) {
		forbidden(`As ${ROLE_LABELS[role].toLowerCase()} you cannot change comments.`);
	}
	const changes: Change[] = [];
	if (patch.body !== undefined && patch.body !== comment.body) {
		if (comment.authorId !== actor.id) {
			forbidden('Only its author can change what a comment says. Reply to it instead.');
		}
		changes.push({ kind: 'comment.edited', verb: 'edited' });
	}
	if (patch.resolved !== undefined && patch.resolved !== comment.resolved) {
		changes.push(
			patch.resolved
				? { kind: 'comment.resolved', verb: 'resolved' }
				: { kind: 'comment.reopened', verb: 'reopened' }
		);
	}
	return changes;
}

/**
 * Changes a comment's body (its author only; marks it edited) or resolves and reopens it (the
 * author, or any role that may comment). A patch that changes nothing writes nothing. The caller
 * has checked that `role` is the actor's role in the comment's team.
 */
export async function updateComment(
	actor: SessionUser,
	role: Role,
	comment: Comment,
	patch: CommentPatchBody,
	where: { route: Route; project: Project }
): Promise<Comment> {
	const changes = changesOf(actor, role, comment, patch);
	if (changes.length > 0) {
		await dbReady();
		const place = await placeNamer(where.route);
		await Comment.sequelize!.transaction(async (transaction: Transaction) => {
			const now = new Date();
			const edited = changes.some((change) => change.kind === 'comment.edited');
			await comment.update(
				{
					...(edited ? { body: patch.body!, editedAt: now } : {}),
					...(patch.resolved !== undefined
						? { resolved: patch.resolved, resolvedById: patch.resolved ? actor.id : null }
						: {})
				},
				{ transaction }
			);
			for (const change of changes) {
				await recordActivity(
					{
						teamId: where.project.teamId,
						projectId: where.project.id,
						routeId: where.route.id,
						actorId: actor.id,
						kind: change.kind,
						summary: `${actor.name} ${change.verb} a comment ${place.on(comment.stepKey)}.`,
						details: { commentId: comment.id, stepId: comment.stepKey }
					},
					transaction
				);
			}
		});
	}
	return (await Comment.findByPk(comment.id, {
		include: [{ model: User, as: 'author', attributes: ['id', 'name'] }]
	}))!;
}
