import { POST as importRoute } from '../../src/routes/api/projects/[projectId=uuid]/routes/import/+server';
import type { SessionUser } from '../../src/lib/types';

/** Posts a route file to the import endpoint as the given user, e.g. an SDF or a route document. */
export async function uploadRouteFile(options: {
	user: SessionUser;
	projectId: string;
	name: string;
	text: string;
}): Promise<{ status: number; body: unknown }> {
	const form = new FormData();
	form.set('file', new File([options.text], options.name));
	const request = new Request('http://localhost/api/projects/x/routes/import', {
		method: 'POST',
		body: form
	});
	const event = {
		url: new URL(request.url),
		request,
		locals: { user: options.user, via: 'session' },
		params: { projectId: options.projectId }
	};
	const response = await (importRoute as unknown as (e: unknown) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}
