import type { RequestEvent } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { perceptionRules } from '../../src/lib/chem/patterns';
import {
	buildRuleTable,
	CONDITION_IDS,
	FREE_GROUP_IDS,
	loadRuleTable,
	PROTECTING_GROUP_IDS
} from '../../src/lib/rules';
import { DEFAULT_RULE_FILES } from '../../src/lib/rules/default-files';
import { GET } from '../../src/routes/api/rules/+server';
import { fakeEvent } from '../factories';

// rules/protecting-groups.json carries both halves of each row: how a PG is recognised
// (src/lib/chem) and how it behaves (src/lib/rules). These tests hold the halves together.

describe('one rule table for perception and the check', () => {
	it('recognises exactly the protecting groups the table rates, and the same free groups', () => {
		expect(
			perceptionRules()
				.protectingGroups.map((pg) => pg.id)
				.sort()
		).toEqual([...PROTECTING_GROUP_IDS].sort());
		expect(
			perceptionRules()
				.groups.map((g) => g.id)
				.sort()
		).toEqual([...FREE_GROUP_IDS].sort());
	});

	it('masks only groups the PG claims to protect, and every masked group is a known free group', () => {
		for (const pg of perceptionRules().protectingGroups) {
			for (const id of pg.protects) {
				expect(FREE_GROUP_IDS as readonly string[]).toContain(id);
			}
		}
	});

	it('keeps the pattern source apart from the ratings source on every row', () => {
		for (const pg of loadRuleTable().protectingGroups) {
			const row = pg as typeof pg & { patternSource?: string };
			expect(row.source, pg.id).toMatch(/\w/);
			expect(row.patternSource, pg.id).toMatch(/\w/);
		}
	});
});

describe('reagent-level ratings', () => {
	const withRating = (entry: Record<string, string>) => {
		const rows = structuredClone(DEFAULT_RULE_FILES.protectingGroups) as {
			id: string;
			reagentRatings?: unknown[];
		}[];
		rows.find((r) => r.id === 'Ac')!.reagentRatings = [entry];
		return () => buildRuleTable({ ...DEFAULT_RULE_FILES, protectingGroups: rows });
	};
	it('must name a reagent of rules/reagents.json that brings the condition', () => {
		expect(
			withRating({ reagent: 'unobtainium', condition: 'base-amine', rating: 'labile', reason: 'x' })
		).toThrow(
			/rules\/protecting-groups\.json: \[\d+\]\.reagentRatings\[0\]\.reagent: unknown reagent "unobtainium"/
		);
		expect(
			withRating({ reagent: 'piperidine', condition: 'fluoride', rating: 'labile', reason: 'x' })
		).toThrow(/"piperidine" does not bring fluoride/);
		expect(
			withRating({
				reagent: 'NH3',
				condition: 'base-amine',
				rating: 'labile',
				reason: 'ammonia removes acetates'
			})
		).not.toThrow();
	});
});

describe('GET /api/rules', () => {
	it('lists conditions, protecting groups with their source and ratings, and groups', async () => {
		const user = { id: '00000000-0000-4000-8000-000000000001', email: 'a@lab.example', name: 'A' };
		const response = await (GET as unknown as (e: RequestEvent) => Promise<Response>)(
			fakeEvent({ user, path: '/api/rules' })
		);
		expect(response.status).toBe(200);
		const body = await response.json();
		expect(body.conditions.map((c: { id: string }) => c.id)).toEqual([...CONDITION_IDS]);
		expect(body.protectingGroups).toHaveLength(PROTECTING_GROUP_IDS.length);
		const tbs = body.protectingGroups.find((pg: { id: string }) => pg.id === 'TBS');
		expect(tbs).toMatchObject({
			label: expect.any(String),
			source: expect.stringMatching(/\w/),
			stability: expect.any(Object)
		});
		expect(Object.keys(tbs.stability).sort()).toEqual([...CONDITION_IDS].sort());
		// Textbook: TBS ethers are cleaved by fluoride (Greene's, from memory).
		expect(tbs.stability.fluoride).toBe('labile');
		expect(body.groups.find((g: { id: string }) => g.id === 'ketone')).toMatchObject({
			smarts: '[#6][CX3](=O)[#6]'
		});
		expect(JSON.stringify(body)).not.toContain('compiled');
	});

	it('answers 401 without a user', async () => {
		const response = await (GET as unknown as (e: RequestEvent) => Promise<Response>)(
			fakeEvent({ path: '/api/rules' })
		);
		expect(response.status).toBe(401);
	});
});
