import { fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { can } from '$lib/policy';
import { paths } from '$lib/paths';
import { requireTeamAction } from '$lib/server/auth/guards';
import { forgetCallerMemberships } from '$lib/server/auth/memberships';
import { recentActivity } from '$lib/server/services/activity';
import {
	addMember,
	changeRole,
	getTeam,
	membersOf,
	removeMember,
	TeamRuleError
} from '$lib/server/services/teams';
import { addMemberSchema, changeRoleSchema, removeMemberSchema } from './schema';

export const load: PageServerLoad = async (event) => {
	const { teamId } = event.params;
	const { role, user } = await requireTeamAction(event, teamId, 'project.read');
	const [team, members, activity, addForm] = await Promise.all([
		getTeam(teamId),
		membersOf(teamId),
		recentActivity({ teamId }, 20),
		superValidate(zod4(addMemberSchema))
	]);
	return {
		team: { id: team!.id, name: team!.name },
		members,
		activity,
		addForm,
		role,
		me: user.id,
		canManage: can(role, 'team.manage')
	};
};

/**
 * Runs a team rule change and turns a broken rule into a form error the page shows. The caller's
 * memberships read by the guard are dropped: the change may be their own role, and the page and
 * layout rendered after the action must show it.
 */
async function keepingRules(event: { locals: App.Locals }, run: () => Promise<void>) {
	try {
		await run();
		forgetCallerMemberships(event);
		return null;
	} catch (caught) {
		if (caught instanceof TeamRuleError) {
			return fail(400, { problem: caught.message });
		}
		throw caught;
	}
}

export const actions: Actions = {
	add: async (event) => {
		const { user } = await requireTeamAction(event, event.params.teamId, 'team.manage');
		const form = await superValidate(event.request, zod4(addMemberSchema));
		if (!form.valid) {
			return fail(400, { addForm: form });
		}
		try {
			const added = await addMember(user, event.params.teamId, form.data);
			const link = added.setPasswordToken
				? new URL(paths.setPassword(added.setPasswordToken), event.url.origin).href
				: null;
			return message(form, {
				text: link
					? `${added.userName} was added. Send them this one-time link to choose a password (it works once, for 7 days):`
					: `${added.userName} already has an Orthogon account and can now open this team’s projects.`,
				link
			});
		} catch (caught) {
			if (caught instanceof TeamRuleError) {
				return message(form, { text: caught.message, link: null }, { status: 400 });
			}
			throw caught;
		}
	},
	changeRole: async (event) => {
		const { user } = await requireTeamAction(event, event.params.teamId, 'team.manage');
		const parsed = changeRoleSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) {
			return fail(400, { problem: 'Choose a role.' });
		}
		return keepingRules(event, () =>
			changeRole(user, event.params.teamId, parsed.data.membershipId, parsed.data.role)
		);
	},
	remove: async (event) => {
		const { user } = await requireTeamAction(event, event.params.teamId, 'team.manage');
		const parsed = removeMemberSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) {
			return fail(400, { problem: 'That member was not found.' });
		}
		return keepingRules(event, () =>
			removeMember(user, event.params.teamId, parsed.data.membershipId)
		);
	}
};
