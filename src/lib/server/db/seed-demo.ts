import type { RouteDocument } from '../../route/document';
import { hashPassword } from '../auth/passwords';
import { dbReady, Membership, Project, Team, User } from '.';
import { DEMO_PASSWORD, DEMO_TEAMS } from './demo-scenario';
import { ActivityEvent } from './models';
import { createRoute } from '../services/routes';

/** Fills an empty database with the demo scenario; leaves any database with users alone. */
export async function seedDemoIfEmpty(): Promise<boolean> {
	await dbReady();
	if ((await User.count()) > 0) {
		return false;
	}
	const passwordHash = await hashPassword(DEMO_PASSWORD);
	// Routes go in through the route service (its own transaction) once the people exist.
	const routes: { lead: User; project: Project; document: RouteDocument }[] = [];
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
					for (const document of p.routes) {
						routes.push({ lead, project, document });
					}
				}
			}
		}
	});
	for (const { lead, project, document } of routes) {
		await createRoute({ id: lead.id, email: lead.email, name: lead.name }, project, document);
	}
	return true;
}
