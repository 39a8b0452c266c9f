import { hashPassword } from '../auth/passwords';
import { dbReady, Membership, Project, Team, User } from '.';
import { DEMO_PASSWORD, DEMO_TEAMS } from './demo-scenario';
import { ActivityEvent } from './models';

/** Fills an empty database with the demo scenario; leaves any database with users alone. */
export async function seedDemoIfEmpty(): Promise<boolean> {
	await dbReady();
	if ((await User.count()) > 0) return false;
	const passwordHash = await hashPassword(DEMO_PASSWORD);
	await User.sequelize!.transaction(async (transaction) => {
		for (const demoTeam of DEMO_TEAMS) {
			const team = await Team.create({ name: demoTeam.name }, { transaction });
			let leadId: string | null = null;
			for (const person of demoTeam.people) {
				const user = await User.create(
					{ email: person.email, name: person.name, passwordHash },
					{ transaction }
				);
				if (person.role === 'lead') leadId ??= user.id;
				await Membership.create({ userId: user.id, teamId: team.id, role: person.role }, { transaction });
			}
			for (const p of demoTeam.projects) {
				const project = await Project.create(
					{ teamId: team.id, name: p.name, description: p.description, createdById: leadId, archivedAt: null },
					{ transaction }
				);
				await ActivityEvent.create(
					{
						teamId: team.id,
						projectId: project.id,
						routeId: null,
						actorId: leadId,
						kind: 'project.created',
						summary: `The demo set-up created the project “${project.name}”.`,
						details: null
					},
					{ transaction }
				);
			}
		}
	});
	return true;
}
