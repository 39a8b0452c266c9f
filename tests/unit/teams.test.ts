import { beforeEach, describe, expect, it } from 'vitest';
import { verifyCredentials } from '../../src/lib/server/auth/credentials';
import { ActivityEvent, Membership, User } from '../../src/lib/server/db';
import {
	setPasswordLinkOwner,
	setPasswordWithLink
} from '../../src/lib/server/services/set-password-links';
import {
	addMember,
	changeRole,
	membersOf,
	removeMember,
	TeamRuleError,
	teamsOf
} from '../../src/lib/server/services/teams';
import { freshDatabase, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
beforeEach(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
});

const membershipOf = async (userId: string) =>
	(await Membership.findOne({ where: { userId, teamId: f.team.id } }))!;

describe('adding members', () => {
	it('creates an account without a password and a one-time link that sets it', async () => {
		const added = await addMember(f.people.lead, f.team.id, {
			email: ' New.Person@Lab.example ',
			name: 'New Person',
			role: 'reviewer'
		});
		expect(added.setPasswordToken).toMatch(/^osp_/);
		const user = await User.findOne({ where: { email: 'new.person@lab.example' } });
		expect(user?.passwordHash).toBeNull();
		expect(await setPasswordLinkOwner(added.setPasswordToken!)).toEqual({
			email: 'new.person@lab.example',
			name: 'New Person'
		});

		expect(await setPasswordWithLink(added.setPasswordToken!, 'a-long-password')).toBe(true);
		expect(await verifyCredentials('new.person@lab.example', 'a-long-password')).toMatchObject({
			name: 'New Person'
		});
		// One-time: the same link cannot set a password again.
		expect(await setPasswordWithLink(added.setPasswordToken!, 'another-password')).toBe(false);
		expect(await setPasswordLinkOwner(added.setPasswordToken!)).toBeNull();
		expect((await teamsOf(user!.id)).map((t) => t.role)).toEqual(['reviewer']);
	});

	it('adds an existing account without issuing a link', async () => {
		await User.update({ passwordHash: 'x' }, { where: { id: f.people.outsider.id } });
		const added = await addMember(f.people.lead, f.team.id, {
			email: f.people.outsider.email,
			name: '',
			role: 'viewer'
		});
		expect(added.setPasswordToken).toBeNull();
		expect((await teamsOf(f.people.outsider.id)).length).toBe(2);
	});

	it('refuses a second membership in the same team', async () => {
		await expect(
			addMember(f.people.lead, f.team.id, {
				email: f.people.chemist.email,
				name: '',
				role: 'viewer'
			})
		).rejects.toThrow(TeamRuleError);
	});

	it('records who added whom', async () => {
		await addMember(f.people.lead, f.team.id, {
			email: 'x@lab.example',
			name: 'Xu',
			role: 'chemist'
		});
		const event = await ActivityEvent.findOne({ where: { kind: 'member.added' } });
		expect(event?.summary).toBe('Lead added Xu as chemist.');
	});
});

describe('the last lead', () => {
	it('cannot be demoted or removed', async () => {
		const lead = await membershipOf(f.people.lead.id);
		await expect(changeRole(f.people.lead, f.team.id, lead.id, 'chemist')).rejects.toThrow(
			/at least one lead/
		);
		await expect(removeMember(f.people.lead, f.team.id, lead.id)).rejects.toThrow(/only lead/);
	});

	it('can step down once another member is lead', async () => {
		const chemist = await membershipOf(f.people.chemist.id);
		await changeRole(f.people.lead, f.team.id, chemist.id, 'lead');
		const lead = await membershipOf(f.people.lead.id);
		await changeRole(f.people.lead, f.team.id, lead.id, 'viewer');
		const roles = Object.fromEntries((await membersOf(f.team.id)).map((m) => [m.name, m.role]));
		expect(roles).toMatchObject({ Lead: 'viewer', Chemist: 'lead' });
	});
});

describe('removing members', () => {
	it('takes the team away from them', async () => {
		const reviewer = await membershipOf(f.people.reviewer.id);
		await removeMember(f.people.lead, f.team.id, reviewer.id);
		expect(await teamsOf(f.people.reviewer.id)).toEqual([]);
	});
	it('does not reach into another team', async () => {
		const otherLead = await Membership.findOne({ where: { userId: f.people.outsider.id } });
		await expect(removeMember(f.people.lead, f.team.id, otherLead!.id)).rejects.toThrow(
			/not a member/
		);
	});
});
