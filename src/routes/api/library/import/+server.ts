import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import type { LibraryImportAnswer } from '$lib/api/answers';
import { MAX_IMPORT_CSV_BYTES } from '$lib/library/contract';
import { apiError, apiHandler } from '$lib/server/api';
import { requireTeamAction, requireUser } from '$lib/server/auth/guards';
import { parseFields } from '$lib/server/fields';
import { importLibraryCsv } from '$lib/server/services/library-import';

const tooLarge = () =>
	apiError(
		413,
		'too_large',
		`A library CSV is limited to ${MAX_IMPORT_CSV_BYTES / 1024 / 1024} MB; nothing was imported.`
	);

/**
 * `POST /api/library/import` (multipart: `file`, a CSV, and `teamId`) → 201 `{ created, updated,
 * unchanged }` (lead, chemist). All rows or none: any bad row → 422 `invalid_rows` listing every
 * problem as `{ row, column, reason }`; over the size limit → 413.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	if (!event.request.headers.get('content-type')?.startsWith('multipart/form-data')) {
		return apiError(
			415,
			'unsupported_media_type',
			'Send multipart/form-data with the CSV in the field “file” and the team in “teamId”.'
		);
	}
	if (Number(event.request.headers.get('content-length') ?? 0) > MAX_IMPORT_CSV_BYTES + 64 * 1024) {
		return tooLarge();
	}
	const form = await event.request.formData().catch(() => null);
	if (!form) {
		return apiError(400, 'bad_request', 'The multipart body could not be read.');
	}
	const { teamId } = parseFields(z.object({ teamId: z.uuid() }), {
		teamId: form.get('teamId') ?? undefined
	});
	const { user, role } = await requireTeamAction(event, teamId, 'library.add');
	const file = form.get('file');
	if (!(file instanceof File)) {
		return apiError(400, 'missing_file', 'Attach the CSV file in the field “file”.');
	}
	if (file.size > MAX_IMPORT_CSV_BYTES) {
		return tooLarge();
	}
	const answer = await importLibraryCsv(user, role, teamId, {
		// The name reaches the activity feed: control characters (a NUL) never get stored.
		// eslint-disable-next-line no-control-regex -- removing control characters is the point
		name: file.name.replace(/[\u0000-\u001F\u007F]/g, '').slice(0, 120) || 'library.csv',
		text: await file.text()
	});
	return json(answer satisfies LibraryImportAnswer, { status: 201 });
});
