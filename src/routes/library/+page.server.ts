import { fail, type RequestEvent } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import type { ApiResult } from '$lib/client/api';
import { can } from '$lib/policy';
import { isUuid } from '$lib/uuid';
import { notFound, requireTeamAction, requireUser } from '$lib/server/auth/guards';
import { teamsOfCaller } from '$lib/server/auth/memberships';
import { routeMapLabels } from '$lib/server/route-map-labels';
import { findSavedCondition, listSavedConditions } from '$lib/server/services/library';
import {
	approveEntry,
	deleteEntry,
	refusedField,
	saveEntry,
	setEntryRetired
} from './library-writes.server';
import { blankEntry, entryIdSchema, libraryEntrySchema } from './schema';

export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const teams = await teamsOfCaller(event, user.id);
	const asked = event.url.searchParams.get('team');
	const team = asked ? teams.find((t) => t.id === asked) : teams[0];
	if (asked && !team) {
		notFound('That team');
	}
	const protectingGroups = [...routeMapLabels().protectingGroups].map(([id, label]) => ({
		id,
		label
	}));
	if (!team) {
		return { teams, team: null, protectingGroups };
	}
	const [conditions, form] = await Promise.all([
		listSavedConditions([team.id], {}),
		superValidate({ ...blankEntry, teamId: team.id }, zod4(libraryEntrySchema), {
			errors: false
		})
	]);
	return {
		teams,
		team,
		userId: user.id,
		// The page only hides what a role cannot use; the API decides every write.
		canAdd: can(team.role, 'library.add'),
		canApprove: can(team.role, 'library.approve'),
		conditions,
		protectingGroups,
		form
	};
};

/** A refused row action, in words for the page (the API's message names the reason). */
const refused = (result: ApiResult<unknown>) =>
	result.ok ? undefined : fail(result.status || 503, { problem: result.message });

/**
 * The entry a row button names, after the page's own guard on its team (404 for another team,
 * 403 without `action`); the API then decides author-or-lead for the write itself.
 */
async function guardedEntryId(event: RequestEvent, action: 'library.add' | 'library.approve') {
	requireUser(event);
	const parsed = entryIdSchema.safeParse(Object.fromEntries(await event.request.formData()));
	const entry = parsed.success ? await findSavedCondition(parsed.data.id) : null;
	if (!entry) {
		notFound('That library entry');
	}
	await requireTeamAction(event, entry.teamId, action);
	return entry.id;
}

export const actions: Actions = {
	save: async (event) => {
		requireUser(event);
		const form = await superValidate(event.request, zod4(libraryEntrySchema));
		// The team is guarded before the fields, so another team's id is a 404 whatever the body.
		const teamId = isUuid(form.data.teamId) ? form.data.teamId : notFound('That team');
		await requireTeamAction(event, teamId, 'library.add');
		if (!form.valid) {
			return fail(400, { form });
		}
		const result = await saveEntry(event.fetch, form.data);
		if (result.ok) {
			return message(form, form.data.id ? 'Saved.' : 'Added to the library.');
		}
		const field = refusedField(result.details, Object.keys(form.data));
		if (result.status === 422 && field) {
			return setError(form, field as keyof typeof form.data, result.message);
		}
		return message(form, result.message, { status: result.status === 403 ? 403 : 400 });
	},
	approve: async (event) =>
		refused(await approveEntry(event.fetch, await guardedEntryId(event, 'library.approve'))),
	retire: async (event) =>
		refused(await setEntryRetired(event.fetch, await guardedEntryId(event, 'library.add'), true)),
	restore: async (event) =>
		refused(await setEntryRetired(event.fetch, await guardedEntryId(event, 'library.add'), false)),
	delete: async (event) =>
		refused(await deleteEntry(event.fetch, await guardedEntryId(event, 'library.add')))
};
