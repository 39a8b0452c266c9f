import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import type { ImportedRouteAnswer } from '$lib/api/answers';
import { apiError, apiHandler } from '$lib/server/api';
import { requireProjectAction } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { FIELD_LIMITS } from '$lib/schemas/limits';
import { MAX_IMPORT_BYTES } from '$lib/server/route-sdf';
import { createRoute } from '$lib/server/services/routes';

/** JSON by its name or its first character; SDF and molfiles by name or an `M  END` line. */
function kindOf(file: File, text: string): 'json' | 'sdf' | null {
	const name = file.name.toLowerCase();
	if (name.endsWith('.json') || /^\s*[[{]/.test(text)) {
		return 'json';
	}
	if (/\.(sdf|sd|mol)$/.test(name) || /^M {2}END\s*$/m.test(text)) {
		return 'sdf';
	}
	return null;
}

/**
 * `POST /api/projects/{projectId}/routes/import` (multipart, field `file`: SDF or route JSON;
 * optional `name`) → `201 { id }`. The route is created in one transaction, so a refused file
 * leaves nothing behind.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { project, user } = await requireProjectAction(event, event.params.projectId, 'route.edit');
	if (!event.request.headers.get('content-type')?.startsWith('multipart/form-data')) {
		return apiError(
			415,
			'unsupported_media_type',
			'Send the file as multipart/form-data in the field “file”.'
		);
	}
	const declared = Number(event.request.headers.get('content-length') ?? 0);
	if (declared > MAX_IMPORT_BYTES + 64 * 1024) {
		return tooLarge();
	}
	const form = await event.request.formData().catch(() => null);
	const file = form?.get('file');
	if (!(file instanceof File)) {
		return apiError(400, 'missing_file', 'Attach the SDF or route JSON file in the field “file”.');
	}
	if (file.size > MAX_IMPORT_BYTES) {
		return tooLarge();
	}
	const text = await file.text();
	if (text.trim() === '') {
		return apiError(422, 'empty_file', `The file “${file.name}” is empty.`);
	}
	const kind = kindOf(file, text);
	if (!kind) {
		return apiError(
			415,
			'unsupported_type',
			`“${file.name}” is neither an SDF (or molfile) nor a route JSON file.`
		);
	}
	const given = String(form?.get('name') ?? '').trim();
	const name = (given || file.name.replace(/\.[^.]+$/, '') || 'Imported route').slice(
		0,
		FIELD_LIMITS.routeName.max
	);
	// Reading every structure is chemistry: it runs on the pool, and a refused file answers 422
	// (`invalid_import`, or `structure_too_large` naming the record) with nothing stored.
	const document = await runChemistry(kind === 'json' ? 'importJson' : 'importSdf', { text, name });
	const route = await createRoute(user, project, given ? { ...document, name } : document);
	const imported: ImportedRouteAnswer = { id: route.id };
	return json(imported, { status: 201 });
});

function tooLarge() {
	return apiError(
		413,
		'too_large',
		`An import file is limited to ${MAX_IMPORT_BYTES / 1024 / 1024} MB.`
	);
}
