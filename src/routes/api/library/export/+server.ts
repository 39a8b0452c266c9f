import type { RequestHandler } from './$types';
import { z } from 'zod';
import { apiHandler } from '$lib/server/api';
import { requireTeamAction, requireUser } from '$lib/server/auth/guards';
import { parseFields } from '$lib/server/fields';
import { libraryCsv } from '$lib/server/services/library-csv';

/**
 * `GET /api/library/export?teamId` → the team's library as CSV (a header row of
 * LIBRARY_CSV_COLUMNS, one row per entry), as an attachment; every role of the team.
 */
export const GET: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const { teamId } = parseFields(
		z.object({ teamId: z.uuid({ error: 'Name the team: ?teamId=…' }) }),
		Object.fromEntries(event.url.searchParams)
	);
	await requireTeamAction(event, teamId, 'project.read');
	return new Response(await libraryCsv(teamId), {
		headers: {
			'content-type': 'text/csv; charset=utf-8',
			'content-disposition': 'attachment; filename="condition-library.csv"',
			'cache-control': 'no-store'
		}
	});
});
