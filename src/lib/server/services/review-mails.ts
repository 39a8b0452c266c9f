import { Op, type Transaction } from 'sequelize';
import { paths } from '../../paths';
import type { ReviewAction } from '../../review/contract';
import type { SessionUser } from '../../types';
import { Membership, ReviewEvent, User, type Project, type Route } from '../db';
import { appUrl } from '../mail/links';
import type { MailDraft } from '../mail/outbox';

// Who hears about a review action, and what they read. Review mails go out whatever a person
// chose for comment mails: a review request or a verdict is work addressed to them.

type Recipient = { id: string; name: string; email: string };

/** What the mails need to know about the action just taken. */
export type ReviewMailContext = {
	action: ReviewAction;
	actor: SessionUser;
	route: Pick<Route, 'id' | 'name' | 'createdById'>;
	project: Project;
	/** The route's version the action was taken on. */
	version: number;
	note: string | null;
	/** `request` only: the people asked to review. */
	reviewers: Recipient[];
};

/**
 * The team's current members among `userIds`, without the actor: someone who has left the team
 * hears nothing more of its routes, and nobody is told of their own action.
 */
async function membersAmong(
	userIds: (string | null | undefined)[],
	context: ReviewMailContext,
	transaction: Transaction
): Promise<Recipient[]> {
	const wanted = [...new Set(userIds)].filter(
		(id): id is string => !!id && id !== context.actor.id
	);
	if (wanted.length === 0) {
		return [];
	}
	const memberships = await Membership.findAll({
		where: { teamId: context.project.teamId, userId: { [Op.in]: wanted } },
		include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
		transaction
	});
	return memberships.flatMap((m) =>
		m.user ? [{ id: m.user.id, name: m.user.name, email: m.user.email }] : []
	);
}

/** Who made the route's latest review request, read in the action's transaction. */
async function latestRequesterId(routeId: string, transaction: Transaction) {
	const latest = await ReviewEvent.findOne({
		where: { routeId, action: 'request' },
		order: [['createdAt', 'DESC']],
		attributes: ['actorId'],
		transaction
	});
	return latest?.actorId ?? null;
}

function noteBlock(context: ReviewMailContext): string {
	return context.note ? `\n${context.actor.name} wrote:\n\n${context.note}\n` : '';
}

function mailText(context: ReviewMailContext, opening: string): string {
	const { route, project } = context;
	return [
		opening,
		noteBlock(context),
		`Open the route: ${appUrl(paths.route(route.id))}`,
		'',
		`— Orthogon, project “${project.name}”`
	].join('\n');
}

const VERDICT_SUBJECTS = {
	approve: 'Approved',
	'request-changes': 'Changes requested'
} as const;

/**
 * The mails an action sends: a request to each requested reviewer; an approval or a request for
 * changes to the route's author and the latest requester (each once). A withdrawal sends none.
 */
export async function reviewMailDrafts(
	context: ReviewMailContext,
	transaction: Transaction
): Promise<MailDraft[]> {
	const { action, actor, route, project, version } = context;
	const draft = (to: Recipient, subject: string, opening: string): MailDraft => ({
		teamId: project.teamId,
		to: to.email,
		subject,
		text: mailText(context, opening)
	});
	if (action === 'request') {
		const reviewers = await membersAmong(
			context.reviewers.map((r) => r.id),
			context,
			transaction
		);
		return reviewers.map((reviewer) =>
			draft(
				reviewer,
				`Review requested: “${route.name}”`,
				`${actor.name} asks you, ${reviewer.name}, to review the route “${route.name}” (version ${version}).\n`
			)
		);
	}
	if (action === 'approve' || action === 'request-changes') {
		const people = await membersAmong(
			[route.createdById, await latestRequesterId(route.id, transaction)],
			context,
			transaction
		);
		const verdict =
			action === 'approve'
				? `${actor.name} approved the route “${route.name}” (version ${version}).\n`
				: `${actor.name} asked for changes to the route “${route.name}” (version ${version}).\n`;
		return people.map((person) =>
			draft(person, `${VERDICT_SUBJECTS[action]}: “${route.name}”`, verdict)
		);
	}
	return [];
}
