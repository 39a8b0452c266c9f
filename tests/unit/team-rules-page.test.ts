import { isActionFailure, isHttpError, type RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { actions, load } from '../../src/routes/teams/[teamId=uuid]/rules/+page.server';
import { TeamRuleOverride } from '../../src/lib/server/db';
import { recentActivity } from '../../src/lib/server/services/activity';
import type { RuleGrid } from '../../src/lib/team-rules/grid';
import { fakeEvent, freshDatabase, makeTeamWithEveryRole } from '../factories';

// The team's rules page: who sees what (every role reads, only a lead gets the form), the grid
// with the team's cells marked, and the add and remove actions as a browser posts them.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
type Who = keyof typeof f.people;
type PageData = {
	grid: RuleGrid;
	unfitRules: string[];
	canOverride: boolean;
	overrides: { id: string; subject: string; reagent?: string }[];
	choices: { subjects: { value: string; label: string }[]; reagents: string[] };
};

async function page(who: Who, teamId = f.team.id): Promise<PageData> {
	const event = fakeEvent({ user: f.people[who], path: `/teams/${teamId}/rules` });
	Object.assign(event, { params: { teamId } });
	return (await (load as unknown as (e: RequestEvent) => Promise<PageData>)(event))!;
}

async function act(who: Who, name: 'add' | 'remove', fields: Record<string, string>) {
	const url = new URL(`/teams/${f.team.id}/rules?/${name}`, 'http://localhost');
	const request = new Request(url, {
		method: 'POST',
		body: new URLSearchParams(fields),
		headers: { 'content-type': 'application/x-www-form-urlencoded' }
	});
	const event = {
		url,
		request,
		params: { teamId: f.team.id },
		locals: { user: f.people[who], via: 'session' },
		getClientAddress: () => '127.0.0.1',
		cookies: { get: () => undefined, set: () => undefined, delete: () => undefined }
	};
	return (actions[name] as (e: unknown) => Promise<unknown>)(event);
}

const fields = {
	subject: 'TBS',
	condition: 'base-aqueous',
	reagent: '',
	rating: 'caution',
	reason: 'Migrates to the neighbouring OH with K2CO3/MeOH on our diols.',
	source: 'Notebook OG-14, p. 3'
};

const cell = (data: PageData, pg: string, condition: string) => {
	const row = data.grid.rows.find((r) => r.id === pg)!;
	const i = data.grid.conditions.findIndex((c) => c.id === condition);
	return { rating: row.ratings[i], teamRule: row.overridden.includes(condition as never) };
};

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
});

describe('the team rules page', () => {
	it('shows every role the table, offers the form to a lead only, and hides it from other teams', async () => {
		for (const who of ['lead', 'chemist', 'reviewer', 'viewer'] as const) {
			const data = await page(who);
			expect(data.canOverride).toBe(who === 'lead');
			// Every protecting group has a row, every condition class a column.
			expect(data.grid.rows.length).toBeGreaterThan(40);
			expect(data.grid.rows.every((r) => r.ratings.length === data.grid.conditions.length)).toBe(
				true
			);
		}
		await expect(page('outsider')).rejects.toSatisfy((e) => isHttpError(e) && e.status === 404);
		const { choices } = await page('lead');
		expect(choices.subjects).toContainEqual({
			value: 'TBS',
			label: 'TBS · tert-butyldimethylsilyl ether (protecting group)'
		});
		expect(choices.reagents).toContain('TBAF');
		// A solvent brings no class, so it cannot be overridden and is not offered.
		expect(choices.reagents).not.toContain('CH2Cl2');
	});

	it('lets a lead add a class-wide rule from the form; the grid marks that cell and its finer class', async () => {
		// rules/protecting-groups.json: TBS is stable to aqueous base (book rating).
		expect(cell(await page('viewer'), 'TBS', 'base-aqueous')).toEqual({
			rating: 'stable',
			teamRule: false
		});
		const refused = await act('chemist', 'add', fields).catch((e: unknown) => e);
		expect(isHttpError(refused) && refused.status).toBe(403);
		const answer = await act('lead', 'add', fields);
		expect(isActionFailure(answer)).toBe(false);
		const data = await page('viewer');
		expect(cell(data, 'TBS', 'base-aqueous')).toEqual({ rating: 'caution', teamRule: true });
		expect(cell(data, 'TBS', 'base-aqueous-mild')).toEqual({ rating: 'caution', teamRule: true });
		expect(cell(data, 'TBS', 'fluoride')).toEqual({ rating: 'labile', teamRule: false });
		expect(data.overrides).toHaveLength(1);
		expect(data.overrides[0]).not.toHaveProperty('reagent');
	});

	it('shows the service’s refusal under the field, and the 409 as the form’s message', async () => {
		const wrongClass = await act('lead', 'add', {
			...fields,
			condition: 'acid-strong',
			reagent: 'TBAF'
		});
		expect(isActionFailure(wrongClass)).toBe(true);
		const form = (wrongClass as { data: { form: { errors: Record<string, string[]> } } }).data.form;
		expect(form.errors.reagent?.[0]).toContain('TBAF brings fluoride');
		const twice = (await act('lead', 'add', fields)) as {
			status: number;
			data: { form: { message: { text: string; tone: string } } };
		};
		expect(twice.status).toBe(409);
		expect(twice.data.form.message).toMatchObject({ tone: 'problem' });
		expect(twice.data.form.message.text).toContain('already rates TBS under');
		expect(await TeamRuleOverride.count()).toBe(1);
	});

	it('keeps a reagent-only rule out of the grid but in the list', async () => {
		await act('lead', 'add', {
			...fields,
			condition: 'fluoride',
			reagent: 'TBAF',
			rating: 'stable'
		});
		const data = await page('viewer');
		expect(cell(data, 'TBS', 'fluoride')).toEqual({ rating: 'labile', teamRule: false });
		expect(data.overrides.map((o) => o.reagent ?? null)).toEqual([null, 'TBAF']);
	});

	it('lets a lead remove a rule (the cell is the book’s again) and writes it to the feed', async () => {
		const [classWide] = (await page('lead')).overrides;
		const refused = await act('viewer', 'remove', { overrideId: classWide!.id }).catch(
			(e: unknown) => e
		);
		expect(isHttpError(refused) && refused.status).toBe(403);
		expect(await act('lead', 'remove', { overrideId: classWide!.id })).toEqual({ removed: true });
		expect(cell(await page('viewer'), 'TBS', 'base-aqueous')).toEqual({
			rating: 'stable',
			teamRule: false
		});
		const gone = await act('lead', 'remove', { overrideId: classWide!.id });
		expect(isActionFailure(gone) && gone.status).toBe(404);
		const lines = (await recentActivity({ teamId: f.team.id })).map((l) => l.summary);
		// rules/conditions.json labels base-aqueous "Hydroxide, carbonate or alkoxide".
		expect(lines[0]).toBe(
			'Lead removed the team rule TBS under Hydroxide, carbonate or alkoxide (was caution); the table’s rating applies again.'
		);
	});

	it('names a stored rule the table no longer has and shows the bundled table, not a broken page', async () => {
		// A row written before the table dropped its PG (a direct insert: the API refuses it now).
		const stale = await TeamRuleOverride.create({
			teamId: f.team.id,
			subject: 'retired-pg',
			condition: 'fluoride',
			reagent: null,
			rating: 'labile',
			reason: 'Old rule',
			source: 'Old notebook',
			authorId: f.people.lead.id
		});
		try {
			const data = await page('viewer');
			expect(data.unfitRules.join('\n')).toContain('retired-pg');
			// The TBAF-only row still stored is not applied either: the grid is the bundled one.
			expect(cell(data, 'TBS', 'fluoride')).toEqual({ rating: 'labile', teamRule: false });
			expect(data.grid.rows.every((row) => row.overridden.length === 0)).toBe(true);
		} finally {
			await stale.destroy();
		}
		expect((await page('viewer')).unfitRules).toEqual([]);
	});
});
