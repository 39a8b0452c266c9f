import { Op, type Transaction } from 'sequelize';
import { paths } from '../../paths';
import { mentionedIn } from '../../review/mentions';
import type { SessionUser } from '../../types';
import { Comment, Membership, User, type Route } from '../db';
import { appUrl } from '../mail/links';
import type { MailDraft } from '../mail/outbox';
import { commentMailsOff } from './mail-preferences';

// Who hears about a new comment (issue 15, "Who hears what"): the route's author, the earlier
// participants of the comment's thread (the route's comments on the same step, or the route's own
// thread), and anyone it @mentions. Only current members of the route's team (a former member
// must not read the team's work in their inbox), never the comment's own author, each person
// once, and nobody who turned comment mails off.

/** Why a person gets the mail; a mention outranks the other two (its subject says so). */
type Reason = 'mentioned' | 'route-author' | 'participant';

const WHY: Record<Reason, string> = {
	mentioned: 'You get this mail because you were mentioned.',
	'route-author': 'You get this mail because you wrote this route.',
	participant: 'You get this mail because you took part in this thread.'
};

export type NewComment = {
	comment: Comment;
	route: Route;
	teamId: string;
	author: SessionUser;
	/** How prose names the comment's step, e.g. `step "s2" (TBAF, THF)`; null for the route thread. */
	stepLabel: string | null;
};

/** The people to tell, each with the strongest reason; the comment's author is never one. */
async function audience(
	{ comment, route, teamId, author }: NewComment,
	transaction: Transaction
): Promise<Map<string, { person: User; reason: Reason }>> {
	const [memberships, thread] = await Promise.all([
		Membership.findAll({
			where: { teamId },
			include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
			transaction
		}),
		Comment.findAll({
			where: { routeId: route.id, stepKey: comment.stepKey, id: { [Op.ne]: comment.id } },
			attributes: ['authorId'],
			transaction
		})
	]);
	const members = new Map(memberships.flatMap((m) => (m.user ? [[m.user.id, m.user]] : [])));
	const reasons = new Map<string, Reason>();
	for (const earlier of thread) {
		if (earlier.authorId) {
			reasons.set(earlier.authorId, 'participant');
		}
	}
	if (route.createdById) {
		reasons.set(route.createdById, 'route-author');
	}
	for (const person of mentionedIn(comment.body, [...members.values()])) {
		reasons.set(person.id, 'mentioned');
	}
	reasons.delete(author.id);
	const off = await commentMailsOff([...reasons.keys()]);
	const told = new Map<string, { person: User; reason: Reason }>();
	for (const [id, reason] of reasons) {
		const person = members.get(id);
		if (person && !off.has(id)) {
			told.set(id, { person, reason });
		}
	}
	return told;
}

/** The link a mail gives: the route page, opened on the step for a step comment. */
export function commentLink(routeId: string, stepId: string | null): string {
	const path = paths.route(routeId);
	return appUrl(stepId === null ? path : `${path}?step=${encodeURIComponent(stepId)}`);
}

/** The mails a new comment causes, ready for `queueMail` in the comment's own transaction. */
export async function newCommentMails(
	notice: NewComment,
	transaction: Transaction
): Promise<MailDraft[]> {
	const { comment, route, teamId, author, stepLabel } = notice;
	const where = stepLabel ? ` — ${stepLabel}` : '';
	const on = stepLabel ? `on ${stepLabel} of “${route.name}”` : `on the route “${route.name}”`;
	const text = (reason: Reason) =>
		[
			`${author.name} ${reason === 'mentioned' ? 'mentioned you in a comment' : 'commented'} ${on}:`,
			'',
			comment.body,
			'',
			`Open it in Orthogon: ${commentLink(route.id, comment.stepKey)}`,
			'',
			`${WHY[reason]} Comment mails can be turned off on your Account page: ${appUrl(paths.account())}`
		].join('\n');
	const told = await audience(notice, transaction);
	return [...told.values()].map(({ person, reason }) => ({
		teamId,
		to: person.email,
		subject:
			reason === 'mentioned'
				? `${author.name} mentioned you on “${route.name}”${where}`
				: `New comment on “${route.name}”${where}`,
		text: text(reason)
	}));
}
