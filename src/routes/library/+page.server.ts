import { fail, type RequestEvent } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import type { ApiResult } from '$lib/client/api';
import { can } from '$lib/policy';
import { notFound, requireUser } from '$lib/server/auth/guards';
import { teamsOfCaller } from '$lib/server/auth/memberships';
import { routeMapLabels } from '$lib/server/route-map-labels';
import { listSavedConditions } from '$lib/server/services/library';
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
	result.ok ? undefined : fail(result.status || 500, { problem: result.message });

async function entryId(event: RequestEvent) {
	requireUser(event);
	const parsed = entryIdSchema.safeParse(Object.fromEntries(await event.request.formData()));
	return parsed.success ? parsed.data.id : notFound('That library entry');
}

export const actions: Actions = {
	save: async (event) => {
		requireUser(event);
		const form = await superValidate(event.request, zod4(libraryEntrySchema));
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
	approve: async (event) => refused(await approveEntry(event.fetch, await entryId(event))),
	retire: async (event) => refused(await setEntryRetired(event.fetch, await entryId(event), true)),
	restore: async (event) =>
		refused(await setEntryRetired(event.fetch, await entryId(event), false)),
	delete: async (event) => refused(await deleteEntry(event.fetch, await entryId(event)))
};
