import type { RouteDocument } from '../../route/document';
import { hashPassword } from '../auth/passwords';
import { dbReady, Membership, Project, Team, User } from '.';
import {
	DEMO_PASSWORD,
	DEMO_TEAMS,
	type DemoReview,
	type DemoRule,
	type DemoSavedCondition
} from './demo-scenario';
import { ActivityEvent } from './models';
import { createRoute } from '../services/routes';
import { takeReviewAction } from '../services/review-actions';
import { addComment } from '../services/comment-writes';
import { approveSavedCondition, createSavedCondition } from '../services/library-writes';
import { addOverride } from '../services/team-rules';
import type { Route } from './models';
import type { SessionUser } from '../../types';

/** Fills an empty database with the demo scenario; leaves any database with users alone. */
export async function seedDemoIfEmpty(): Promise<boolean> {
	await dbReady();
	if ((await User.count()) > 0) {
		return false;
	}
	const passwordHash = await hashPassword(DEMO_PASSWORD);
	// Routes go in through the route service (its own transaction) once the people exist.
	const routes: { lead: User; project: Project; document: RouteDocument; review?: DemoReview }[] =
		[];
	await User.sequelize!.transaction(async (transaction) => {
		for (const demoTeam of DEMO_TEAMS) {
			const team = await Team.create({ name: demoTeam.name }, { transaction });
			let lead: User | null = null;
			for (const person of demoTeam.people) {
				const user = await User.create(
					{ email: person.email, name: person.name, passwordHash },
					{ transaction }
				);
				if (person.role === 'lead') {
					lead ??= user;
				}
				await Membership.create(
					{ userId: user.id, teamId: team.id, role: person.role },
					{ transaction }
				);
			}
			for (const p of demoTeam.projects) {
				const project = await Project.create(
					{
						teamId: team.id,
						name: p.name,
						description: p.description,
						createdById: lead?.id ?? null,
						archivedAt: null
					},
					{ transaction }
				);
				await ActivityEvent.create(
					{
						teamId: team.id,
						projectId: project.id,
						routeId: null,
						actorId: lead?.id ?? null,
						kind: 'project.created',
						summary: `The demo set-up created the project “${project.name}”.`,
						details: null
					},
					{ transaction }
				);
				if (lead) {
					for (const { review, ...document } of p.routes) {
						routes.push({ lead, project, document, review });
					}
				}
			}
		}
	});
	for (const demoTeam of DEMO_TEAMS) {
		await seedLibrary(demoTeam.name, demoTeam.library);
		await seedRules(demoTeam.name, demoTeam.rules);
	}
	for (const { lead, project, document, review } of routes) {
		const route = await createRoute(sessionUser(lead), project, document);
		if (review) {
			await startReview(route, project, review);
		}
	}
	return true;
}

const sessionUser = (user: User): SessionUser => ({
	id: user.id,
	email: user.email,
	name: user.name
});

async function demoPerson(email: string, teamName: string) {
	const user = await User.findOne({ where: { email } });
	if (!user) {
		throw new Error(`Demo scenario: ${email} (of “${teamName}”) is not a demo person.`);
	}
	return sessionUser(user);
}

/** A team's saved conditions, written and approved through the library's services (activity too). */
async function seedLibrary(teamName: string, entries: DemoSavedCondition[]) {
	const team = await Team.findOne({ where: { name: teamName } });
	const person = (email: string) => demoPerson(email, teamName);
	for (const { by, approvedBy, ...fields } of entries) {
		const entry = await createSavedCondition(await person(by), { ...fields, teamId: team!.id });
		if (approvedBy) {
			await approveSavedCondition(await person(approvedBy), entry);
		}
	}
}

/** A team's rule overrides, set through the rules service (so the feed has them). */
async function seedRules(teamName: string, rules: DemoRule[]) {
	const team = await Team.findOne({ where: { name: teamName } });
	for (const { by, ...body } of rules) {
		await addOverride(await demoPerson(by, teamName), team!.id, body);
	}
}

/**
 * Puts a demo route in review through the same services the API uses, so its history, activity
 * lines and mails are the real thing.
 */
async function startReview(route: Route, project: Project, review: DemoReview) {
	const member = async (email: string) => {
		const user = await User.findOne({ where: { email } });
		const membership = user
			? await Membership.findOne({ where: { userId: user.id, teamId: project.teamId } })
			: null;
		if (!user || !membership) {
			throw new Error(`Demo scenario: ${email} is not in the team of “${route.name}”.`);
		}
		return { user: sessionUser(user), role: membership.role };
	};
	const requester = await member(review.requestedBy);
	await takeReviewAction(requester.user, requester.role, route, project, {
		action: 'request',
		reviewers: review.reviewers,
		note: review.note
	});
	let previous: string | undefined;
	for (const comment of review.comments) {
		const { user } = await member(comment.by);
		const written = await addComment(user, route, project, {
			body: comment.body,
			stepId: comment.stepId,
			replyTo: comment.replyToPrevious ? previous : undefined
		});
		previous = written.id;
	}
}
