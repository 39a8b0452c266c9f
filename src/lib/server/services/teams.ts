import { dbReady, Membership, Team, User } from '../db';
import type { Role } from '../../policy';
import { ROLE_LABELS } from '../../policy';
import type { SessionUser } from '../auth/credentials';
import { normaliseEmail } from '../auth/credentials';
import { hashPassword } from '../auth/passwords';
import { recordActivity } from './activity';
import { issueSetPasswordLink } from './set-password-links';

import type { TeamOfUser } from '../../types';
export type { TeamOfUser };

export async function teamsOf(userId: string): Promise<TeamOfUser[]> {
	await dbReady();
	const memberships = await Membership.findAll({
		where: { userId },
		include: [{ model: Team, as: 'team', attributes: ['id', 'name'] }]
	});
	return memberships
		.filter((m) => m.team)
		.map((m) => ({ id: m.teamId, name: m.team!.name, role: m.role }))
		.sort((a, b) => a.name.localeCompare(b.name));
}

export async function getTeam(teamId: string) {
	await dbReady();
	return Team.findByPk(teamId);
}

export type Member = {
	membershipId: string;
	userId: string;
	name: string;
	email: string;
	role: Role;
	hasPassword: boolean;
};

export async function membersOf(teamId: string): Promise<Member[]> {
	await dbReady();
	const memberships = await Membership.findAll({
		where: { teamId },
		include: [{ model: User, as: 'user' }]
	});
	return memberships
		.filter((m) => m.user)
		.map((m) => ({
			membershipId: m.id,
			userId: m.userId,
			name: m.user!.name,
			email: m.user!.email,
			role: m.role,
			hasPassword: Boolean(m.user!.passwordHash)
		}))
		.sort((a, b) => a.name.localeCompare(b.name));
}

export class TeamRuleError extends Error {}

/**
 * Adds a person to the team. Someone new gets an account without a password and a one-time
 * set-password link (returned for the lead to pass on); an existing account just joins.
 */
export async function addMember(
	actor: SessionUser,
	teamId: string,
	input: { email: string; name: string; role: Role }
): Promise<{ setPasswordToken: string | null; userName: string }> {
	await dbReady();
	const email = normaliseEmail(input.email);
	return Membership.sequelize!.transaction(async (transaction) => {
		let user = await User.findOne({ where: { email }, transaction });
		let setPasswordToken: string | null = null;
		if (!user) {
			user = await User.create(
				{ email, name: input.name.trim() || email, passwordHash: null },
				{ transaction }
			);
		}
		if (await Membership.findOne({ where: { userId: user.id, teamId }, transaction })) {
			throw new TeamRuleError(`${user.email} is already a member of this team.`);
		}
		if (!user.passwordHash) {
			setPasswordToken = await issueSetPasswordLink(user.id, transaction);
		}
		await Membership.create({ userId: user.id, teamId, role: input.role }, { transaction });
		await recordActivity(
			{
				teamId,
				actorId: actor.id,
				kind: 'member.added',
				summary: `${actor.name} added ${user.name} as ${ROLE_LABELS[input.role].toLowerCase()}.`
			},
			transaction
		);
		return { setPasswordToken, userName: user.name };
	});
}

/** A membership of this team (never another team's, whatever id is posted). */
async function membershipIn(teamId: string, membershipId: string) {
	await dbReady();
	const membership = await Membership.findOne({
		where: { id: membershipId, teamId },
		include: [{ model: User, as: 'user' }]
	});
	if (!membership) {
		throw new TeamRuleError('That person is not a member of this team.');
	}
	return membership;
}

async function leadCount(teamId: string) {
	return Membership.count({ where: { teamId, role: 'lead' } });
}

export async function changeRole(
	actor: SessionUser,
	teamId: string,
	membershipId: string,
	role: Role
): Promise<void> {
	const membership = await membershipIn(teamId, membershipId);
	if (membership.role === role) {
		return;
	}
	if (membership.role === 'lead' && (await leadCount(teamId)) <= 1) {
		throw new TeamRuleError('A team needs at least one lead. Make someone else lead first.');
	}
	const before = membership.role;
	await membership.update({ role });
	await recordActivity({
		teamId,
		actorId: actor.id,
		kind: 'member.role-changed',
		summary: `${actor.name} changed ${membership.user?.name ?? 'a member'} from ${ROLE_LABELS[before].toLowerCase()} to ${ROLE_LABELS[role].toLowerCase()}.`
	});
}

export async function removeMember(
	actor: SessionUser,
	teamId: string,
	membershipId: string
): Promise<void> {
	const membership = await membershipIn(teamId, membershipId);
	if (membership.role === 'lead' && (await leadCount(teamId)) <= 1) {
		throw new TeamRuleError('This is the team’s only lead and cannot be removed.');
	}
	await membership.destroy();
	await recordActivity({
		teamId,
		actorId: actor.id,
		kind: 'member.removed',
		summary: `${actor.name} removed ${membership.user?.name ?? 'a member'} from the team.`
	});
}

/** Creates a team with its first lead (the command line and the demo seed use this). */
export async function createTeamWithLead(input: {
	teamName: string;
	email: string;
	name: string;
	password: string;
}) {
	await dbReady();
	const passwordHash = await hashPassword(input.password);
	return Team.sequelize!.transaction(async (transaction) => {
		const team = await Team.create({ name: input.teamName.trim() }, { transaction });
		const email = normaliseEmail(input.email);
		const [user] = await User.findOrCreate({
			where: { email },
			defaults: { email, name: input.name.trim(), passwordHash },
			transaction
		});
		await Membership.create({ userId: user.id, teamId: team.id, role: 'lead' }, { transaction });
		return { team, user };
	});
}
