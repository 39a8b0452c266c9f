import { isActionFailure, isHttpError, isRedirect, type RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { requireFormBodies } from '../../src/lib/server/hooks/form-bodies';
import { Project } from '../../src/lib/server/db';
import { addComment } from '../../src/lib/server/services/comment-writes';
import { createRoute } from '../../src/lib/server/services/routes';
import { freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';
import { addEntry } from '../factories/library';
import { concrete, discoverEndpoints, routeModule, type Endpoint } from '../factories/route-tree';

// Malformed bodies, wrong content types and control characters at every endpoint that reads a
// body, as a lead (so every guard lets the request through to the body): never a 500, never a
// hang, always a message in the right shape, and no control character stored anywhere. Structures themselves are fuzzed by the chemistry
// tests; here a NUL rides in every text field.

const NUL_DOCUMENT = {
	name: 'Route\u0000',
	intermediates: [
		{ id: 'a', label: 'start\u0000', structure: 'CCO\u0000' },
		{ id: 'b', structure: 'CC=O' }
	],
	steps: [
		{
			id: 's1',
			from: ['a'],
			to: 'b',
			reagents: 'PCC\u0000',
			notes: '\u0007',
			conditions: ['x\u0000']
		}
	]
};

type Body = { name: string; contentType: string; body: string | FormData; nul?: boolean };
const JSON_BODIES: Body[] = [
	{ name: 'truncated JSON', contentType: 'application/json', body: '{"name": "x"' },
	{ name: 'JSON null', contentType: 'application/json', body: 'null' },
	{ name: 'JSON array', contentType: 'application/json', body: '[1,2]' },
	{ name: 'JSON string with NUL', contentType: 'application/json', body: '"\\u0000"' },
	{ name: 'empty body', contentType: 'application/json', body: '' },
	{ name: 'raw NUL bytes', contentType: 'application/json', body: '\u0000\u0000' },
	{ name: 'text/plain', contentType: 'text/plain', body: 'hello' },
	{
		name: 'garbage multipart',
		contentType: 'multipart/form-data; boundary=zz',
		body: '--zz\r\nnonsense'
	},
	{
		name: 'document with NUL in every text field',
		contentType: 'application/json',
		body: JSON.stringify(NUL_DOCUMENT),
		nul: true
	},
	{
		name: 'save with NUL',
		contentType: 'application/json',
		body: JSON.stringify({ version: 1, document: NUL_DOCUMENT }),
		nul: true
	},
	{
		name: 'comment with NUL',
		contentType: 'application/json',
		body: JSON.stringify({ body: 'TBS\u0000 then PCC', resolved: true }),
		nul: true
	},
	{
		name: 'review request with a NUL in its note',
		contentType: 'application/json',
		body: JSON.stringify({ action: 'request', reviewers: [], note: 'See s2\u0000' }),
		nul: true
	},
	{
		name: 'library entry with NUL',
		contentType: 'application/json',
		body: JSON.stringify({
			teamId: '',
			protectingGroup: 'TBS',
			kind: 'install',
			reagents: 'TBSCl\u0000',
			notes: '\u0000'
		}),
		nul: true
	},
	{
		name: 'team rule with NUL',
		contentType: 'application/json',
		body: JSON.stringify({
			subject: 'TBS',
			condition: 'heat',
			rating: 'caution',
			reason: 'Lost at reflux\u0000',
			source: '\u0000'
		}),
		nul: true
	},
	{
		name: 'project with NUL',
		contentType: 'application/json',
		body: JSON.stringify({ name: 'Kitti\u0000wake', description: '\u0000', teamId: '' }),
		nul: true
	}
];

const nulForm = () => {
	const form = new FormData();
	for (const field of [
		'name',
		'description',
		'label',
		'email',
		'role',
		'routeId',
		'membershipId',
		'teamId',
		'current',
		'next',
		'confirm',
		// The library's and the team rules' forms.
		'protectingGroup',
		'kind',
		'reagents',
		'notes',
		'reference',
		'subject',
		'condition',
		'rating',
		'reason',
		'source'
	]) {
		form.set(field, `x\u0000${field}`);
	}
	return form;
};
const FORM_BODIES: Body[] = [
	{ name: 'text/plain', contentType: 'text/plain', body: 'name=x' },
	{ name: 'JSON', contentType: 'application/json', body: '{"name":"x"}' },
	{
		name: 'garbage multipart',
		contentType: 'multipart/form-data; boundary=zz',
		body: '--zz\r\nnonsense'
	},
	{
		name: 'urlencoded NUL in every field',
		contentType: 'application/x-www-form-urlencoded',
		body: new URLSearchParams([...nulForm()].map(([k, v]) => [k, String(v)])).toString(),
		nul: true
	},
	{ name: 'multipart NUL in every field', contentType: '', body: nulForm(), nul: true }
];

// Auth.js owns these (its own parsing); the sign-in page and links are fuzzed by the auth tests.
const NOT_HERE = [
	'action default /signin',
	'action default /signout',
	'action default /set-password/[token]'
];
const HANG_LIMIT_MS = 10_000;

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let endpoints: Endpoint[] = [];
beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	endpoints = (await discoverEndpoints()).filter(
		(e) => !NOT_HERE.includes(e.key) && !['GET', 'fallback'].includes(e.name)
	);
}, 120_000);

/** Every stored row, in every table, that holds a NUL or another C0 control but tab/CR/LF. */
async function rowsHoldingControlCharacters(): Promise<string[]> {
	const sequelize = Project.sequelize!;
	const tables = (await sequelize.getQueryInterface().showAllTables()) as string[];
	const found: string[] = [];
	for (const table of tables) {
		const [rows] = await sequelize.query(`SELECT * FROM "${table}"`);
		for (const row of rows as Record<string, unknown>[]) {
			const values = Object.values(row).filter((v): v is string => typeof v === 'string');
			// eslint-disable-next-line no-control-regex -- looking for stored control characters
			if (values.some((v) => /[\u0000-\u0008\u000B\u000C\u000E-\u001F]/.test(v))) {
				found.push(`${table}: ${JSON.stringify(row).slice(0, 160)}`);
			}
		}
	}
	return found;
}

type Verdict = { status: number; message: string };

/** What the client would see: status and the message, from a Response, a thrown error or an action's result. */
async function verdict(run: () => Promise<unknown>): Promise<Verdict> {
	let timer: ReturnType<typeof setTimeout> | undefined;
	const hang = new Promise<never>((_, reject) => {
		timer = setTimeout(
			() => reject(new Error(`no answer within ${HANG_LIMIT_MS} ms`)),
			HANG_LIMIT_MS
		);
	});
	try {
		const result = await Promise.race([run(), hang]);
		if (result instanceof Response) {
			const text = await result.text();
			if (result.status < 400) {
				return { status: result.status, message: '' };
			}
			const type = result.headers.get('content-type') ?? '';
			const message = type.includes('json')
				? ((JSON.parse(text) as { error?: { message?: string } }).error?.message ?? '')
				: text;
			return { status: result.status, message };
		}
		if (isActionFailure(result)) {
			return { status: result.status, message: JSON.stringify(result.data) };
		}
		return { status: 200, message: '' };
	} catch (caught) {
		if (isRedirect(caught)) {
			return { status: caught.status, message: '' };
		}
		if (isHttpError(caught)) {
			return { status: caught.status, message: caught.body.message };
		}
		return {
			status: 500,
			message: `thrown: ${caught instanceof Error ? caught.message : String(caught)}`
		};
	} finally {
		clearTimeout(timer);
	}
}

async function send(endpoint: Endpoint, body: Body): Promise<Verdict> {
	const project = await makeProject(f.team.id, 'Fuzz project');
	const route = await createRoute(f.people.lead, project, {
		name: 'Fuzz route',
		intermediates: [],
		steps: []
	});
	const comment = await addComment(f.people.lead, route, project, { body: 'Fuzz' });
	const saved = await addEntry(f.people.lead, f.team.id);
	const { params, path } = concrete(endpoint.route, {
		conditionId: saved.id,
		projectId: project.id,
		routeId: route.id,
		commentId: comment.id,
		teamId: f.team.id,
		rank: '1'
	});
	const module = await routeModule(endpoint.file);
	const url = new URL(
		endpoint.kind === 'action' ? `${path}?/${endpoint.name}` : path,
		'http://localhost'
	);
	const headers = body.contentType ? { 'content-type': body.contentType } : undefined;
	// A body naming the team gets the real one, so the guard lets it through to the fields.
	const sent =
		typeof body.body === 'string'
			? body.body.replace('"teamId":""', `"teamId":"${f.team.id}"`)
			: body.body;
	const request = new Request(url, {
		method: endpoint.kind === 'action' ? 'POST' : endpoint.name,
		headers,
		body: sent
	});
	const noCookies = {
		get: () => undefined,
		getAll: () => [],
		set: () => undefined,
		delete: () => undefined
	};
	const event = {
		url,
		request,
		params,
		locals: { user: f.people.lead, via: 'session' },
		getClientAddress: () => '127.0.0.1',
		cookies: noCookies,
		setHeaders: () => undefined
	} as unknown as RequestEvent;
	if (endpoint.kind === 'method') {
		return verdict(async () =>
			(module[endpoint.name] as (e: RequestEvent) => Promise<Response>)(event)
		);
	}
	const action = (module.actions as Record<string, (e: RequestEvent) => Promise<unknown>>)[
		endpoint.name
	]!;
	// Page posts meet the form-body hook first, as in the running app.
	let acted: unknown;
	return verdict(async () => {
		const answer = await requireFormBodies({
			event,
			resolve: async () => ((acted = await action(event)), new Response(null, { status: 204 }))
		});
		return answer.status === 204 ? acted : answer;
	});
}

describe('malformed bodies at every endpoint that reads one', () => {
	it('finds the endpoints', () => {
		expect(endpoints.length).toBeGreaterThan(15);
	});

	it('never answers 500 or hangs; every refusal carries a message; NUL is never accepted into storage', async () => {
		const problems: string[] = [];
		for (const endpoint of endpoints) {
			for (const body of endpoint.kind === 'method' ? JSON_BODIES : FORM_BODIES) {
				const { status, message } = await send(endpoint, body);
				const where = `${endpoint.key} ← ${body.name}: ${status}`;
				if (status >= 500) {
					problems.push(`${where} ${message}`);
				} else if (status >= 400 && !message.trim()) {
					problems.push(`${where} without a message`);
				}
			}
		}
		expect(problems).toEqual([]);
		expect(await rowsHoldingControlCharacters()).toEqual([]);
	}, 170_000);
});
