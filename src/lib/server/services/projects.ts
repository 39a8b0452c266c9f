import { Op } from 'sequelize';
import { dbReady, Membership, Project, Team } from '../db';
import type { SessionUser } from '../auth/credentials';
import { recordActivity } from './activity';

export type ProjectSummary = {
	id: string;
	name: string;
	description: string;
	teamId: string;
	teamName: string;
	archived: boolean;
	updatedAt: Date;
};

function summarise(project: Project): ProjectSummary {
	return {
		id: project.id,
		name: project.name,
		description: project.description,
		teamId: project.teamId,
		teamName: project.team?.name ?? '',
		archived: project.archivedAt !== null,
		updatedAt: project.updatedAt
	};
}

/** Projects of every team the user belongs to, newest first; archived ones only on request. */
export async function listProjectsFor(
	userId: string,
	options: { includeArchived?: boolean } = {}
): Promise<ProjectSummary[]> {
	await dbReady();
	const memberships = await Membership.findAll({ where: { userId }, attributes: ['teamId'] });
	const teamIds = memberships.map((m) => m.teamId);
	if (teamIds.length === 0) {
		return [];
	}
	const projects = await Project.findAll({
		where: {
			teamId: { [Op.in]: teamIds },
			...(options.includeArchived ? {} : { archivedAt: null })
		},
		include: [{ model: Team, as: 'team', attributes: ['name'] }],
		order: [['updatedAt', 'DESC']]
	});
	return projects.map(summarise);
}

export async function getProjectSummary(projectId: string): Promise<ProjectSummary | null> {
	await dbReady();
	const project = await Project.findByPk(projectId, {
		include: [{ model: Team, as: 'team', attributes: ['name'] }]
	});
	return project ? summarise(project) : null;
}

/** Creates a project; the caller has already checked `project.create` in that team. */
export async function createProject(
	actor: SessionUser,
	input: { teamId: string; name: string; description?: string }
): Promise<Project> {
	await dbReady();
	const sequelize = Project.sequelize!;
	return sequelize.transaction(async (transaction) => {
		const project = await Project.create(
			{
				teamId: input.teamId,
				name: input.name.trim(),
				description: (input.description ?? '').trim(),
				createdById: actor.id,
				archivedAt: null
			},
			{ transaction }
		);
		await recordActivity(
			{
				teamId: input.teamId,
				projectId: project.id,
				actorId: actor.id,
				kind: 'project.created',
				summary: `${actor.name} created the project “${project.name}”.`
			},
			transaction
		);
		return project;
	});
}

export async function updateProject(
	actor: SessionUser,
	project: Project,
	changes: { name: string; description: string }
): Promise<void> {
	const before = project.name;
	await Project.sequelize!.transaction(async (transaction) => {
		await project.update(
			{ name: changes.name.trim(), description: changes.description.trim() },
			{ transaction }
		);
		const renamed = before !== project.name;
		await recordActivity(
			{
				teamId: project.teamId,
				projectId: project.id,
				actorId: actor.id,
				kind: renamed ? 'project.renamed' : 'project.described',
				summary: renamed
					? `${actor.name} renamed “${before}” to “${project.name}”.`
					: `${actor.name} updated the target description of “${project.name}”.`
			},
			transaction
		);
	});
}

/** Archives (or restores) a project: it leaves the default list but keeps all its data. */
export async function setProjectArchived(
	actor: SessionUser,
	project: Project,
	archived: boolean
): Promise<void> {
	await Project.sequelize!.transaction(async (transaction) => {
		await project.update({ archivedAt: archived ? new Date() : null }, { transaction });
		await recordActivity(
			{
				teamId: project.teamId,
				projectId: project.id,
				actorId: actor.id,
				kind: archived ? 'project.archived' : 'project.restored',
				summary: `${actor.name} ${archived ? 'archived' : 'restored'} “${project.name}”.`
			},
			transaction
		);
	});
}
