import { isHttpError, isRedirect, type RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { actions, load } from '../../src/routes/library/+page.server';
import * as listApi from '../../src/routes/api/library/+server';
import * as entryApi from '../../src/routes/api/library/[conditionId=uuid]/+server';
import * as approveApi from '../../src/routes/api/library/[conditionId=uuid]/approve/+server';
import { SavedCondition } from '../../src/lib/server/db';
import type { SessionUser } from '../../src/lib/types';
import { fakeEvent, freshDatabase, join, makeTeam, makeTeamWithEveryRole } from '../factories';
import { addEntry } from '../factories/library';

// The library page: what each role is offered, the team picker, another team's id, and the
// form actions reaching the real library API through the request's fetch.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let entryId = '';
type Handler = (event: RequestEvent) => Promise<Response>;

/** A `fetch` that answers the library API's paths with its handlers, as `user`. */
function apiFetch(user: SessionUser): typeof fetch {
	return (async (input: string, init?: RequestInit) => {
		const request = new Request(new URL(input, 'http://localhost'), init);
		const url = new URL(request.url);
		const [, , , id, approve] = url.pathname.split('/');
		const module = approve ? approveApi : id ? entryApi : listApi;
		const handler = (module as Record<string, unknown>)[request.method] as Handler;
		const event = { url, request, params: { conditionId: id }, locals: { user, via: 'session' } };
		return handler(event as unknown as RequestEvent);
	}) as typeof fetch;
}

function pageEvent(user: SessionUser | null, query = '', form?: Record<string, string>) {
	const event = fakeEvent({ user, path: `/library${query}` }) as RequestEvent & {
		fetch: typeof fetch;
	};
	if (user) {
		event.fetch = apiFetch(user);
	}
	if (form) {
		const body = new FormData();
		Object.entries(form).forEach(([name, value]) => body.set(name, value));
		Object.assign(event, { request: new Request(event.url, { method: 'POST', body }) });
	}
	return event;
}

type PageData = {
	team: { id: string } | null;
	canAdd: boolean;
	canApprove: boolean;
	conditions: { id: string; reagents: string; approved: boolean }[];
};
const read = async (user: SessionUser | null, query = '') =>
	(await (load as unknown as (e: RequestEvent) => Promise<PageData>)(pageEvent(user, query)))!;
const act = (name: keyof typeof actions, user: SessionUser, form: Record<string, string>) =>
	(actions[name] as unknown as (e: RequestEvent) => Promise<unknown>)(
		pageEvent(user, `?/${name}`, form)
	);

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	entryId = (await addEntry(f.people.chemist, f.team.id, { reagents: 'TBSOTf, 2,6-lutidine' })).id;
});

describe('the library page load', () => {
	it('lets leads approve, chemists add, and reviewers and viewers only read', async () => {
		const offered = {
			lead: [true, true],
			chemist: [true, false],
			reviewer: [false, false],
			viewer: [false, false]
		} as const;
		for (const [who, [canAdd, canApprove]] of Object.entries(offered)) {
			const data = await read(f.people[who as keyof typeof offered]);
			expect({ who, canAdd: data.canAdd, canApprove: data.canApprove }).toEqual({
				who,
				canAdd,
				canApprove
			});
			expect(data.conditions.map((c) => c.reagents)).toEqual(['TBSOTf, 2,6-lutidine']);
		}
	});

	it("answers 404 for another team's library, and sends a signed-out visitor to sign in", async () => {
		const refused = await read(f.people.outsider, `?team=${f.team.id}`).catch((e: unknown) => e);
		expect(isHttpError(refused) && refused.status).toBe(404);
		const own = await read(f.people.outsider);
		expect(own.team?.id).toBe(f.other.id);
		expect(own.conditions).toEqual([]);
		const anonymous = await read(null).catch((e: unknown) => e);
		expect(isRedirect(anonymous)).toBe(true);
	});

	it('starts the form with blank fields as null, not undefined (a bound input refuses undefined)', async () => {
		const data = (await read(f.people.chemist)) as PageData & {
			form: { data: Record<string, unknown> };
		};
		for (const field of [
			'solvent',
			'temperature',
			'time',
			'scale',
			'yield',
			'reference',
			'notes'
		]) {
			expect(data.form.data[field], field).toBeNull();
		}
		expect(data.form.data.teamId).toBe(f.team.id);
	});

	it('shows the team a person picks when they are in several', async () => {
		const second = await makeTeam('Second bench');
		await join(f.people.reviewer, second.id, 'chemist');
		const picked = await read(f.people.reviewer, `?team=${second.id}`);
		expect(picked.team?.id).toBe(second.id);
		expect(picked.canAdd).toBe(true);
		expect(picked.conditions).toEqual([]);
	});
});

describe('the library page actions', () => {
	const fields = (over: Record<string, string> = {}) => ({
		teamId: f.team.id,
		protectingGroup: 'PMB',
		kind: 'remove',
		reagents: 'DDQ, CH2Cl2/H2O',
		yield: '88',
		...over
	});

	it('a chemist saves a condition through the API', async () => {
		await act('save', f.people.chemist, fields());
		const stored = await SavedCondition.findOne({ where: { reagents: 'DDQ, CH2Cl2/H2O' } });
		expect(stored).toMatchObject({ protectingGroup: 'PMB', kind: 'remove', yield: 88 });
	});

	it('a yield over 100 is refused on the yield field, and nothing is stored', async () => {
		const answer = (await act(
			'save',
			f.people.chemist,
			fields({ reagents: 'x', yield: '140' })
		)) as {
			status: number;
			data: { form: { errors: { yield?: string[] } } };
		};
		expect(answer.status).toBe(400);
		expect(answer.data.form.errors.yield).toEqual(['Yield is between 0 and 100 %.']);
		expect(await SavedCondition.count({ where: { reagents: 'x' } })).toBe(0);
	});

	it("a reviewer's save is refused (403) before it reaches the API, and another team's is a 404", async () => {
		const refusal = await act('save', f.people.reviewer, fields({ reagents: 'y' })).catch(
			(e: unknown) => e
		);
		expect(isHttpError(refusal) && refusal.status).toBe(403);
		const outside = await act('save', f.people.outsider, fields({ reagents: 'y' })).catch(
			(e: unknown) => e
		);
		expect(isHttpError(outside) && outside.status).toBe(404);
		expect(await SavedCondition.count({ where: { reagents: 'y' } })).toBe(0);
	});

	it('a lead approves; a chemist cannot', async () => {
		const refused = await act('approve', f.people.chemist, { id: entryId }).catch(
			(e: unknown) => e
		);
		expect(isHttpError(refused) && refused.status).toBe(403);
		expect((await SavedCondition.findByPk(entryId))?.approvedAt).toBeNull();
		await act('approve', f.people.lead, { id: entryId });
		expect((await SavedCondition.findByPk(entryId))?.approvedAt).not.toBeNull();
	});

	it("a chemist cannot retire another chemist's entry: the API's refusal comes back in words", async () => {
		const other = await addEntry(f.people.lead, f.team.id, { reagents: 'the lead’s own' });
		const answer = (await act('retire', f.people.chemist, { id: other.id })) as {
			status: number;
			data: { problem: string };
		};
		expect(answer.status).toBe(403);
		expect(answer.data.problem).toBeTruthy();
		expect((await SavedCondition.findByPk(other.id))?.retiredAt ?? null).toBeNull();
	});
});
