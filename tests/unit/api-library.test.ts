import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import * as library from '../../src/routes/api/library/+server';
import * as oneEntry from '../../src/routes/api/library/[conditionId=uuid]/+server';
import * as approve from '../../src/routes/api/library/[conditionId=uuid]/approve/+server';
import type { SavedConditionAnswer } from '../../src/lib/api/answers';
import { ActivityEvent, SavedCondition } from '../../src/lib/server/db';
import type { SessionUser } from '../../src/lib/types';
import {
	callApi,
	fakeEvent,
	freshDatabase,
	join,
	makeTeamWithEveryRole,
	makeUser
} from '../factories';
import { addEntry } from '../factories/library';

// The condition library's JSON API against the issue 16 contract: who may list, add, change,
// delete and approve (every role and another team), 422 naming the field, the filters, and the
// activity events. Uses and the step's link: library-uses.test.ts; CSV: api-library-csv.test.ts.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let secondChemist: SessionUser;
type Who = keyof typeof f.people | 'secondChemist';
const as = (who: Who) => (who === 'secondChemist' ? secondChemist : f.people[who]);

const list = (who: Who, query = '') =>
	callApi(library.GET, { user: as(who), method: 'GET', path: `/api/library${query}` });
const post = (who: Who, body: unknown) =>
	callApi(library.POST, { user: as(who), method: 'POST', body, path: '/api/library' });
const patch = (who: Who, conditionId: string, body: unknown) =>
	callApi(oneEntry.PATCH, { user: as(who), method: 'PATCH', body, params: { conditionId } });
const approveAs = (who: Who, conditionId: string) =>
	callApi(approve.POST, { user: as(who), method: 'POST', body: {}, params: { conditionId } });
async function remove(who: Who, conditionId: string) {
	const event = fakeEvent({ user: as(who), method: 'DELETE', path: `/api/library/${conditionId}` });
	Object.assign(event, { params: { conditionId } });
	const response = await (oneEntry.DELETE as unknown as (e: RequestEvent) => Promise<Response>)(
		event
	);
	return { status: response.status, body: response.status === 204 ? null : await response.json() };
}

const tbsOn = () => ({
	teamId: f.team.id,
	protectingGroup: 'TBS',
	kind: 'install',
	reagents: 'TBSOTf, 2,6-lutidine, CH2Cl2',
	temperature: '−78 °C',
	yield: 94,
	reference: 'ELN OG-2031-17',
	notes: 'on the OG-series diol'
});

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	secondChemist = await makeUser('Second chemist');
	await join(secondChemist, f.team.id, 'chemist');
});

describe('library API: adding and listing', () => {
	it('lets a lead and a chemist add (201 { id }); reviewer and viewer 403; another team 404', async () => {
		for (const who of ['lead', 'chemist'] as const) {
			const added = await post(who, tbsOn());
			expect(added.status).toBe(201);
			expect(added.body.id).toMatch(/^[0-9a-f-]{36}$/);
		}
		for (const who of ['reviewer', 'viewer'] as const) {
			expect((await post(who, tbsOn())).status).toBe(403);
		}
		expect((await post('outsider', tbsOn())).status).toBe(404);
		expect(await SavedCondition.count({ where: { teamId: f.team.id } })).toBe(2);
	});

	it('answers every field of the contract, with the classes read from the reagents', async () => {
		const { body } = await post('chemist', { ...tbsOn(), reagents: 'TBAF, THF', kind: 'remove' });
		const { body: listed } = await list('viewer', `?teamId=${f.team.id}&kind=remove`);
		const entry = (listed.conditions as SavedConditionAnswer[]).find((c) => c.id === body.id)!;
		expect(entry).toMatchObject({
			teamId: f.team.id,
			protectingGroup: 'TBS',
			kind: 'remove',
			reagents: 'TBAF, THF',
			conditions: ['fluoride'],
			solvent: null,
			temperature: '−78 °C',
			yield: 94,
			reference: 'ELN OG-2031-17',
			author: { id: f.people.chemist.id, name: 'Chemist' },
			approved: false,
			retired: false,
			uses: 0
		});
		expect(Date.parse(entry.createdAt)).not.toBeNaN();
		expect(Date.parse(entry.updatedAt)).not.toBeNaN();
	});

	it('reads what a following step would carry: says which text it could not read, and the hazards', async () => {
		// OG-Cat 17 is an in-house code no reagent table lists; the reflux in the temperature is heat.
		const { body } = await post('chemist', {
			...tbsOn(),
			protectingGroup: 'dioxolane',
			reagents: 'ethylene glycol, p-TsOH, OG-Cat 17',
			solvent: 'toluene',
			temperature: 'reflux'
		});
		const { body: listed } = await list('viewer', `?teamId=${f.team.id}`);
		const entry = (listed.conditions as SavedConditionAnswer[]).find((c) => c.id === body.id)!;
		expect(entry.unrecognized).toEqual(['OG-Cat 17']);
		// Toluene at reflux (111 °C, CRC Handbook) is above the 80 °C heat threshold; toluene is
		// flammable (common practice), so its caution comes with the entry.
		expect(entry.conditions).toEqual(expect.arrayContaining(['heat']));
		expect(entry.hazards.map((h) => h.reagent)).toEqual(expect.arrayContaining(['toluene']));
		// A fully read entry says nothing is unread.
		const { body: clean } = await post('chemist', { ...tbsOn(), reagents: 'TBAF, THF' });
		const { body: again } = await list('viewer', `?teamId=${f.team.id}`);
		const read = (again.conditions as SavedConditionAnswer[]).find((c) => c.id === clean.id)!;
		expect(read.unrecognized).toEqual([]);
	});

	it('lists for every role of the team; another team’s id → 404; no teamId → only the caller’s teams', async () => {
		for (const who of ['lead', 'chemist', 'reviewer', 'viewer'] as const) {
			const { status, body } = await list(who, `?teamId=${f.team.id}`);
			expect(status).toBe(200);
			expect(body.conditions.length).toBeGreaterThan(0);
		}
		const refused = await list('outsider', `?teamId=${f.team.id}`);
		expect(refused.status).toBe(404);
		expect(refused.body.error.code).toBe('not_found');
		await addEntry(f.people.outsider, f.other.id, { reagents: 'TBSCl, imidazole' });
		const own = await list('outsider');
		expect(own.body.conditions.map((c: SavedConditionAnswer) => c.teamId)).toEqual([f.other.id]);
		const ours = await list('chemist');
		expect(ours.body.conditions.every((c: SavedConditionAnswer) => c.teamId === f.team.id)).toBe(
			true
		);
	});

	it('refuses a yield of 101, an unknown PG id and an unknown kind with 422 naming the field; nothing stored', async () => {
		const before = await SavedCondition.count();
		const cases = [
			[{ yield: 101 }, 'yield'],
			[{ yield: -1 }, 'yield'],
			[{ protectingGroup: 'XYZ' }, 'protectingGroup'],
			[{ kind: 'add' }, 'kind'],
			[{ reagents: '' }, 'reagents']
		] as const;
		for (const [change, field] of cases) {
			const { status, body } = await post('chemist', { ...tbsOn(), ...change });
			expect(status, field).toBe(422);
			expect(body.error.code).toBe('invalid_field');
			expect(body.error.details).toEqual({ field });
			expect(body.error.message).toContain(field);
		}
		const patched = await patch('lead', (await addEntry(f.people.lead, f.team.id)).id, {
			yield: 101
		});
		expect(patched.status).toBe(422);
		expect(patched.body.error.details).toEqual({ field: 'yield' });
		expect(await SavedCondition.count()).toBe(before + 1);
	});
});

describe('library API: filters', () => {
	it('filters by PG, kind, approval and a search of reagents, solvent, notes and reference', async () => {
		const team = f.team.id;
		const pmb = await addEntry(f.people.chemist, team, {
			protectingGroup: 'PMB',
			kind: 'remove',
			reagents: 'DDQ, CH2Cl2/H2O',
			solvent: 'Dichloromethane'
		});
		const acetal = await addEntry(f.people.chemist, team, {
			protectingGroup: 'PMB',
			kind: 'install',
			reagents: 'PMBCl, NaH',
			notes: 'Buffered WORKUP, see notebook'
		});
		await approveAs('lead', pmb.id);
		const ids = async (query: string) =>
			(await list('viewer', `?teamId=${team}&${query}`)).body.conditions.map(
				(c: SavedConditionAnswer) => c.id
			);
		expect(await ids('protectingGroup=PMB')).toEqual([pmb.id, acetal.id]);
		expect(await ids('protectingGroup=PMB&kind=install')).toEqual([acetal.id]);
		expect(await ids('protectingGroup=PMB&approved=true')).toEqual([pmb.id]);
		expect(await ids('protectingGroup=PMB&approved=false')).toEqual([acetal.id]);
		expect(await ids('q=dichloro')).toEqual([pmb.id]);
		expect(await ids('q=workup')).toEqual([acetal.id]);
		expect(await ids('q=ddq')).toEqual([pmb.id]);
		expect(await ids('q=og-2031')).not.toContain(pmb.id);
		const bad = await list('viewer', `?teamId=${team}&kind=sideways`);
		expect(bad.status).toBe(422);
		expect(bad.body.error.details).toEqual({ field: 'kind' });
	});
});

describe('library API: changing, approving, retiring, deleting', () => {
	it('lets the author or a lead change an entry; another chemist, reviewer, viewer 403; another team 404', async () => {
		const entry = await addEntry(f.people.chemist, f.team.id);
		const changed = await patch('chemist', entry.id, { yield: 88, solvent: 'DMF' });
		expect(changed.status).toBe(200);
		expect(changed.body).toMatchObject({ id: entry.id, yield: 88, solvent: 'DMF' });
		expect((await patch('lead', entry.id, { notes: 'scaled to 20 g' })).status).toBe(200);
		for (const who of ['secondChemist', 'reviewer', 'viewer'] as const) {
			expect((await patch(who, entry.id, { yield: 1 })).status, who).toBe(403);
		}
		expect((await patch('outsider', entry.id, { yield: 1 })).status).toBe(404);
		expect((await SavedCondition.findByPk(entry.id))!.yield).toBe(88);
	});

	it('approves for leads only; an edit by its chemist author withdraws the approval, a lead’s keeps it', async () => {
		const entry = await addEntry(f.people.chemist, f.team.id);
		for (const who of ['chemist', 'reviewer', 'viewer'] as const) {
			expect((await approveAs(who, entry.id)).status, who).toBe(403);
		}
		expect((await approveAs('outsider', entry.id)).status).toBe(404);
		const approved = await approveAs('lead', entry.id);
		expect(approved.status).toBe(200);
		expect(approved.body.approved).toBe(true);
		expect((await patch('lead', entry.id, { yield: 90 })).body.approved).toBe(true);
		expect((await patch('chemist', entry.id, { reagents: 'TBSCl, DMAP' })).body.approved).toBe(
			false
		);
	});

	it('retires and restores an entry: kept and listed with retired: true', async () => {
		const entry = await addEntry(f.people.chemist, f.team.id, { reagents: 'TBSCl, Et3N' });
		expect((await patch('chemist', entry.id, { retired: true })).body.retired).toBe(true);
		const { body } = await list('viewer', `?teamId=${f.team.id}&q=Et3N`);
		expect(body.conditions).toEqual([expect.objectContaining({ id: entry.id, retired: true })]);
		expect((await patch('lead', entry.id, { retired: false })).body.retired).toBe(false);
	});

	it('deletes by the author or a lead (204); others 403; another team 404', async () => {
		const mine = await addEntry(f.people.chemist, f.team.id);
		const theirs = await addEntry(f.people.chemist, f.team.id);
		for (const who of ['secondChemist', 'reviewer', 'viewer'] as const) {
			expect((await remove(who, mine.id)).status, who).toBe(403);
		}
		expect((await remove('outsider', mine.id)).status).toBe(404);
		expect((await remove('chemist', mine.id)).status).toBe(204);
		expect((await remove('lead', theirs.id)).status).toBe(204);
		expect(await SavedCondition.count({ where: { id: [mine.id, theirs.id] } })).toBe(0);
		expect((await remove('lead', mine.id)).status).toBe(404);
	});

	it('records create, approve, retire and delete in the team’s activity feed', async () => {
		const { body } = await post('chemist', { ...tbsOn(), reagents: 'TIPSOTf, 2,6-lutidine' });
		await approveAs('lead', body.id);
		await patch('lead', body.id, { retired: true });
		await remove('lead', body.id);
		const events = await ActivityEvent.findAll({ where: { teamId: f.team.id } });
		const mine = events.filter((e) => e.details?.savedConditionId === body.id);
		// Events of one millisecond may tie on createdAt, so the kinds are compared as a set.
		expect(mine.map((e) => e.kind).sort()).toEqual([
			'library.approved',
			'library.created',
			'library.deleted',
			'library.retired'
		]);
		expect(mine.find((e) => e.kind === 'library.created')!.summary).toBe(
			'Chemist added the saved condition TBS, puts it on: “TIPSOTf, 2,6-lutidine”.'
		);
	});
});
