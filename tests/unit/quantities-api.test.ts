// POST /api/quantities and GET /api/azeotropes: the documented shapes, and every refusal as a
// 400/422 in the API error shape whose message names the material or field (never a 500).

import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import type { SessionUser } from '../../src/lib/types';
import { GET as azeotropesGet } from '../../src/routes/api/azeotropes/+server';
import { POST as quantitiesPost } from '../../src/routes/api/quantities/+server';
import { fakeEvent, freshDatabase, makeUser } from '../factories';

let user: SessionUser;
beforeAll(async () => {
	await freshDatabase();
	user = await makeUser();
	// Start the chemistry worker once, so a cold start on a loaded machine does not spend the
	// first test's time budget (that would be a 503 chemistry_timeout, not what is tested here).
	await call(quantitiesPost, { materials: [aldehyde] });
}, 60_000);

async function call(handler: unknown, body?: unknown, who: SessionUser | null = user) {
	const event = fakeEvent({
		user: who,
		path: body === undefined ? '/api/azeotropes' : '/api/quantities',
		method: body === undefined ? 'GET' : 'POST',
		body
	});
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

const aldehyde = {
	name: '4-methylbenzaldehyde',
	role: 'limiting',
	structure: 'Cc1ccc(C=O)cc1',
	mass: 20
};
const glycol = { name: 'ethylene glycol', role: 'reagent', volume: 12 };

describe('POST /api/quantities', () => {
	it('answers the documented shape (20 g aldehyde, 12 mL glycol, toluene trap, 4 readings)', async () => {
		const log = [
			{ minutes: 0, volume: 0 },
			{ minutes: 30, volume: 1.9 },
			{ minutes: 60, volume: 2.95 },
			{ minutes: 90, volume: 2.97 },
			{ minutes: 120, volume: 2.98 }
		];
		const { status, body } = await call(quantitiesPost, {
			materials: [aldehyde, glycol, { name: 'toluene', role: 'solvent', volume: 75 }],
			waterRemoval: { solvent: 'toluene', trapCapacity: 10, log }
		});
		expect(status).toBe(200);
		expect(body.limiting).toBe('4-methylbenzaldehyde');
		expect(Object.keys(body.materials[0]).sort()).toEqual(
			['amount', 'equiv', 'mass', 'molarMass', 'name', 'role'].sort()
		);
		expect(body.materials[1].equiv).toBeCloseTo(1.29, 2);
		expect(body.waterRemoval.theoretical.volume).toBeCloseTo(3.0, 1);
		expect(Object.keys(body.waterRemoval.azeotrope).sort()).toEqual(
			[
				'boilingPoint',
				'solventBoilingPoint',
				'solvent',
				'source',
				'waterLayer',
				'waterMassPercent'
			].sort()
		);
		expect(body.waterRemoval.trapFills).toBe(false);
		expect(body.waterRemoval.progress).toMatchObject({ collected: 2.98, status: 'complete' });
		expect(body.cautions.length).toBeGreaterThan(0);
	});

	it('needs a signed-in user (401 in the API shape)', async () => {
		const { status, body } = await call(quantitiesPost, { materials: [aldehyde] }, null);
		expect(status).toBe(401);
		expect(body.error.code).toBe('unauthenticated');
	});

	it.each([
		[
			'a zero mass',
			[{ ...aldehyde, mass: 0 }],
			/4-methylbenzaldehyde \(materials\[0\]\.mass\): A mass must be greater than zero/
		],
		[
			'a negative volume',
			[aldehyde, { ...glycol, volume: -12 }],
			/ethylene glycol \(materials\[1\]\.volume\): A volume must be greater than zero/
		],
		['no materials', [], /materials: List at least one material/]
	])('400 for %s, naming the material and field', async (_what, materials, message) => {
		const { status, body } = await call(quantitiesPost, { materials });
		expect(status).toBe(400);
		expect(body.error.code).toBe('invalid_body');
		expect(body.error.message).toMatch(message);
	});

	it('400 for a negative trap reading, naming the field', async () => {
		const log = [{ minutes: 0, volume: -1 }];
		const { status, body } = await call(quantitiesPost, {
			materials: [aldehyde],
			waterRemoval: { solvent: 'toluene', log }
		});
		expect(status).toBe(400);
		expect(body.error.message).toMatch(
			/waterRemoval\.log\[0\]\.volume: A collected volume cannot be negative/
		);
	});

	it('400 for a body that is not JSON', async () => {
		const { status, body } = await call(quantitiesPost, 'not json');
		expect(status).toBe(400);
		expect(body.error.code).toBe('invalid_body');
	});

	it.each([
		['no limiting material', { materials: [glycol] }, 'no_limiting', /limiting/],
		[
			'two limiting materials',
			{ materials: [aldehyde, { ...glycol, role: 'limiting' }] },
			'two_limiting',
			/ethylene glycol/
		],
		[
			'a volume without a density',
			{ materials: [aldehyde, { name: 'oil', role: 'reagent', molarMass: 90, volume: 2 }] },
			'no_density',
			/oil: a volume needs a density/
		],
		[
			'a row with no amount',
			{ materials: [aldehyde, { name: 'ethylene glycol', role: 'reagent' }] },
			'missing_amount',
			/ethylene glycol: no amount/
		],
		[
			'an unknown solvent',
			{ materials: [aldehyde], waterRemoval: { solvent: 'octane' } },
			'unknown_solvent',
			/"octane".*known: .*toluene/
		],
		[
			'an unreadable structure',
			{ materials: [{ ...aldehyde, structure: 'C1CC(' }] },
			'unreadable_structure',
			/4-methylbenzaldehyde: the structure cannot be read/
		],
		[
			'times going backwards',
			{
				materials: [aldehyde],
				waterRemoval: {
					solvent: 'toluene',
					log: [
						{ minutes: 30, volume: 1 },
						{ minutes: 10, volume: 2 }
					]
				}
			},
			'log_out_of_order',
			/reading 2 \(10 min\)/
		]
	])('422 for %s', async (_what, request, code, message) => {
		const { status, body } = await call(quantitiesPost, request);
		expect(status).toBe(422);
		expect(body.error.code).toBe(code);
		expect(body.error.message).toMatch(message);
	});
});

describe('GET /api/azeotropes', () => {
	it('lists the rows of rules/azeotropes.json', async () => {
		const { status, body } = await call(azeotropesGet);
		expect(status).toBe(200);
		const toluene = body.azeotropes.find((row: { id: string }) => row.id === 'toluene');
		expect(toluene).toMatchObject({ waterLayer: 'lower', solventBoilingPoint: 110.6 });
		expect(body.azeotropes.some((row: { waterLayer: string }) => row.waterLayer === 'upper')).toBe(
			true
		);
	});

	it('needs a signed-in user', async () => {
		const { status } = await call(azeotropesGet, undefined, null);
		expect(status).toBe(401);
	});
});
