import { describe, expect, it } from 'vitest';
import { VERSION_CONFLICT } from '../../src/lib/api/errors';
import { callApi, isVersionConflict } from '../../src/lib/client/api';
import { ClashCheck } from '../../src/lib/components/route-map/clash-check.svelte';
import { RouteClient } from '../../src/lib/client/route-client';
import { Toasts } from '../../src/lib/client/toasts.svelte';
import { verdictOf } from '../../src/lib/components/route-map/step-view';
import type { RouteDocument } from '../../src/lib/route/document';

// The browser's side of the API: what the wrapper makes of the server's answers, and what the
// route client does with them.

/** A fetch that answers every request with `body` and `status`, as the server would. */
const answering =
	(status: number, body: unknown): typeof fetch =>
	async () =>
		new Response(JSON.stringify(body), {
			status,
			headers: { 'content-type': 'application/json' }
		});

const conflict = (code: string) => ({
	error: { code, message: 'The route changed.', details: { currentVersion: 4 } }
});
const doc: RouteDocument = { name: 'OG-2031', intermediates: [], steps: [] };

describe('a version conflict, told apart once in the API wrapper', () => {
	it('is a 409 with the snake_case code, carrying the stored version', async () => {
		const result = await callApi('/api/routes/r', {}, answering(409, conflict('version_conflict')));
		expect(isVersionConflict(result)).toBe(true);
		expect(result).toMatchObject({
			ok: false,
			code: VERSION_CONFLICT,
			details: { currentVersion: 4 }
		});
	});

	it('is not any other 409, nor the old kebab-case spelling', async () => {
		for (const code of ['version-conflict', 'conflict']) {
			const result = await callApi('/api/routes/r', {}, answering(409, conflict(code)));
			expect(isVersionConflict(result), code).toBe(false);
		}
		const refused = await callApi(
			'/api/routes/r',
			{},
			answering(422, conflict('version_conflict'))
		);
		expect(isVersionConflict(refused)).toBe(false);
	});

	it('leaves a version conflict on save to the conflict notice, and toasts any other failure', async () => {
		const quiet = new Toasts();
		await new RouteClient(quiet, answering(409, conflict('version_conflict'))).save('r', 3, doc);
		expect(quiet.items).toEqual([]);

		const told = new Toasts();
		await new RouteClient(told, answering(409, conflict('version-conflict'))).save('r', 3, doc);
		expect(told.items.map((toast) => toast.message)).toEqual(['Not saved: The route changed.']);
	});

	it('does the same when a plan is saved', async () => {
		const quiet = new Toasts();
		const result = await new RouteClient(
			quiet,
			answering(409, conflict('version_conflict'))
		).savePlan('r', 1, 3);
		expect(isVersionConflict(result)).toBe(true);
		expect(quiet.items).toEqual([]);
	});
});

describe('a step the server could not check', () => {
	it('keeps its error through the route client, so the map reads “Not checked”, not “No clashes”', async () => {
		const error = {
			code: 'invalid_structure',
			message: 'The product cannot be read — it is empty.'
		};
		const body = {
			steps: [
				{ id: 's1', conditions: [], hazards: [], clashes: [], unrecognized: [], error },
				{ id: 's2', conditions: [], hazards: [], clashes: [], unrecognized: [] }
			]
		};
		const checks = await new RouteClient(new Toasts(), answering(200, body)).check('r');
		expect(checks.ok).toBe(true);
		const byStep = (checks as { data: Map<string, Parameters<typeof verdictOf>[0]> }).data;
		expect(verdictOf(byStep.get('s1'))).toEqual({
			tone: 'unchecked',
			label: 'Not checked: The product cannot be read — it is empty.'
		});
		expect(verdictOf(byStep.get('s2')).tone).toBe('fine');
	});
});

describe('a check that could not run at all', () => {
	it('drops the earlier verdicts and says why until a check succeeds, without a toast', async () => {
		const toasts = new Toasts();
		let answer: [number, unknown] = [
			200,
			{ steps: [{ id: 's1', conditions: [], hazards: [], clashes: [], unrecognized: [] }] }
		];
		const client = new RouteClient(toasts, (() => answering(...answer)('')) as typeof fetch);
		const check = new ClashCheck('r', client);
		await check.refresh();
		expect(verdictOf(check.of('s1')).tone).toBe('fine');
		answer = [
			422,
			{
				error: {
					code: 'invalid_team_rules',
					message: 'The team’s rules no longer fit the rule table.'
				}
			}
		];
		await check.refresh();
		// The old "fine" was for an older version: no verdict at all now, and the reason in place.
		expect(check.of('s1')).toBeUndefined();
		expect(check.failure).toBe('The team’s rules no longer fit the rule table.');
		expect(toasts.items).toEqual([]);
		answer[0] = 200;
		answer[1] = { steps: [] };
		await check.refresh();
		expect(check.failure).toBeNull();
	});
});
