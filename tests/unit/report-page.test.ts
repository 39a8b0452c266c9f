import { isHttpError, type RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { load } from '../../src/routes/routes/[routeId=uuid]/report/+page.server';
import type { RouteDocument } from '../../src/lib/route/document';
import type { ReviewCopy } from '../../src/lib/server/services/review-copy';
import { createRoute, saveRoute } from '../../src/lib/server/services/routes';
import { Comment, ReviewEvent, Route } from '../../src/lib/server/db';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';
import { routeOG2031 } from '../factories/route-og2031';

// The printable review copy's load: who may open it, and that it carries, step by step in route
// order, what the route map shows. Structures are the invented OG-2031 intermediates.

const smiles = Object.fromEntries(routeOG2031.map((row) => [row.key, row.smiles]));
// Saved out of route order on purpose (as a chemist drawing backwards would): the copy sorts them.
const document: RouteDocument = {
	name: 'OG-2031 fragment A, first steps',
	intermediates: [
		{ id: 'A01', label: 'phenol ester', structure: smiles.A01! },
		{ id: 'A02', label: 'TBS ether', structure: smiles.A02! },
		{ id: 'A03', label: 'benzyl alcohol', structure: smiles.A03! },
		{ id: 'A04', label: 'aldehyde', structure: smiles.A04! },
		{ id: 'X', label: 'sketch', structure: 'C1CC' }
	],
	steps: [
		// TBAF for an oxidation: the TBS ether kept in A04 is labile to fluoride (rule table:
		// Wuts, Greene's Protective Groups in Organic Synthesis, 5th ed., silyl ether stability).
		{ id: 'oxidise', from: ['A03'], to: 'A04', reagents: 'TBAF, THF' },
		{
			id: 'reduce',
			from: ['A02'],
			to: 'A03',
			reagents: 'LiAlH4, THF',
			quantities: [
				{ name: 'TBS ester', role: 'limiting', structure: 'A02', mass: 2.664 },
				{ name: 'TBS alcohol', role: 'product', structure: 'A03' }
			]
		},
		{
			id: 'protect',
			from: ['A01'],
			to: 'A02',
			reagents: 'TBSCl, imidazole, DMF',
			conditions: ['base-amine'],
			quantities: [{ name: 'phenol ester', role: 'limiting', structure: 'A01' }]
		},
		// An unreadable sketch: the step cannot be checked and must say so.
		{ id: 'sketch', from: ['A04'], to: 'X', reagents: 'NaBH4, MeOH' }
	]
};

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let routeId = '';
type Who = keyof typeof f.people;
type Copy = ReviewCopy & {
	route: { name: string; statusLabel: string; version: number };
	project: { name: string };
};

async function open(who: Who, id = routeId) {
	const event = fakeEvent({ user: f.people[who], path: `/routes/${id}/report` }) as RequestEvent & {
		params: Record<string, string>;
	};
	event.params = { routeId: id };
	return (await (load as unknown as (e: RequestEvent) => Promise<unknown>)(event)) as Copy;
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	const project = await makeProject(f.team.id, 'Cormorant report test');
	const route = await createRoute(f.people.chemist, project, document);
	routeId = route.id;
	const at = (minute: number) => new Date(Date.UTC(2026, 11, 1, 9, minute));
	await ReviewEvent.create({
		routeId,
		actorId: f.people.chemist.id,
		action: 'request',
		reviewerIds: [f.people.reviewer.id],
		note: null,
		version: route.version,
		createdAt: at(0)
	});
	await ReviewEvent.create({
		routeId,
		actorId: f.people.reviewer.id,
		action: 'approve',
		reviewerIds: null,
		note: 'Fine once the oxidant is fixed.',
		version: route.version,
		createdAt: at(30)
	});
	const question = await Comment.create({
		routeId,
		stepKey: 'oxidise',
		replyToId: null,
		authorId: f.people.reviewer.id,
		body: 'TBAF here takes the **TBS** off.',
		resolvedById: null,
		editedAt: null,
		createdAt: at(10)
	});
	await Comment.create({
		routeId,
		stepKey: 'oxidise',
		replyToId: question.id,
		authorId: f.people.chemist.id,
		body: 'Right, I meant DMP.',
		resolvedById: null,
		editedAt: null,
		createdAt: at(11)
	});
	await Comment.create({
		routeId,
		stepKey: null,
		replyToId: null,
		authorId: f.people.lead.id,
		body: 'Overall fine. <script>alert(1)</script><a href="javascript:alert(2)">x</a>',
		resolvedById: null,
		editedAt: null,
		createdAt: at(12)
	});
	await Comment.create({
		routeId,
		stepKey: 'a-step-since-deleted',
		replyToId: null,
		authorId: f.people.viewer.id,
		body: 'Old question.',
		resolvedById: null,
		editedAt: null,
		createdAt: at(13)
	});
});

describe('the review copy page load', () => {
	it('opens for every role of the team and is a 404 for another team', async () => {
		for (const who of ['lead', 'chemist', 'reviewer', 'viewer'] as const) {
			const copy = await open(who);
			expect(copy.route.name, who).toBe('OG-2031 fragment A, first steps');
			expect(copy.project.name).toBe('Cormorant report test');
		}
		const caught = await open('outsider').catch((e: unknown) => e);
		expect(isHttpError(caught) && caught.status).toBe(404);
	});

	it('lists the steps in route order: each after the step that makes its substrate', async () => {
		const copy = await open('viewer');
		expect(copy.steps.map((s) => [s.number, s.id])).toEqual([
			[1, 'protect'],
			[2, 'reduce'],
			[3, 'oxidise'],
			[4, 'sketch']
		]);
	});

	it("carries the route check's clash, and 'Not checked' for the step it could not check", async () => {
		const copy = await open('reviewer');
		expect(copy.checkNote).toBeNull();
		const oxidise = copy.steps.find((s) => s.id === 'oxidise')!;
		expect(oxidise.check?.clashes).toEqual([
			expect.objectContaining({ severity: 'clash', subject: 'TBS', condition: 'fluoride' })
		]);
		expect(oxidise.check?.hazards.map((h) => h.reagent)).toContain('TBAF');
		const sketch = copy.steps.find((s) => s.id === 'sketch')!;
		expect(sketch.check?.error?.message).toMatch(/product/i);
		expect(sketch.check?.clashes).toEqual([]);
	});

	it('labels condition classes, set by hand or read from the reagents', async () => {
		const copy = await open('viewer');
		const protect = copy.steps.find((s) => s.id === 'protect')!;
		expect(protect.conditions[0]).toEqual({
			id: 'base-amine',
			label: expect.any(String),
			byHand: true
		});
		expect(protect.conditions[0]!.label).not.toBe('base-amine');
		const oxidise = copy.steps.find((s) => s.id === 'oxidise')!;
		expect(oxidise.conditions).toContainEqual(
			expect.objectContaining({ id: 'fluoride', byHand: false })
		);
	});

	it('computes quantities where present and says why where they cannot be', async () => {
		const copy = await open('viewer');
		const reduce = copy.steps.find((s) => s.id === 'reduce')!.quantities;
		if (!reduce || !('computed' in reduce)) {
			throw new Error(`no quantities: ${JSON.stringify(reduce)}`);
		}
		// C14H22O3Si 266.41 g/mol, C13H22O2Si 238.40 g/mol (IUPAC 2021 standard atomic weights, by
		// hand): 2.664 g is 10.00 mmol and gives 2.384 g of the alcohol at full conversion.
		expect(reduce.computed.materials[0]!.amount).toBeCloseTo(0.01, 5);
		expect(reduce.computed.theoreticalYield).toBeCloseTo(2.384, 2);
		expect(reduce.computed.cautions.at(-1)!.message).toMatch(/SDS/);
		expect(copy.steps.find((s) => s.id === 'protect')!.quantities).toEqual({
			notComputed: expect.stringContaining('Enter how much phenol ester')
		});
		expect(copy.steps.find((s) => s.id === 'oxidise')!.quantities).toBeNull();
	});

	it('gives drawings, and for an unreadable structure the plain "not drawn" note with its SMILES', async () => {
		const copy = await open('viewer');
		expect(copy.drawingsNote).toBeNull();
		expect(copy.molecules.A02!.svg).toContain('<svg');
		expect(copy.molecules.A02!.formula).toBe('C14H22O3Si');
		expect(copy.molecules.X).toMatchObject({
			svg: null,
			structure: 'C1CC',
			notDrawn: 'Not drawn: the structure cannot be read.'
		});
	});

	it('says drawings and the check are not available when the chemistry runs out of time', async () => {
		process.env.ORTHOGON_CHEM_BUDGET_MS = '1';
		try {
			const copy = await open('viewer');
			// Not the pool's "nothing was checked": that is about the drawing request alone.
			expect(copy.drawingsNote).toBe(
				'Drawings are not available: drawing the structures took longer than the chemistry time limit. Each structure is printed as text; reload the page to try again.'
			);
			expect(copy.molecules.A02).toMatchObject({ svg: null, structure: smiles.A02 });
			expect(copy.checkNote).toMatch(/^Not checked: /);
			expect(copy.steps.every((s) => s.check === null)).toBe(true);
			expect(copy.steps.find((s) => s.id === 'reduce')!.quantities).toEqual({
				notComputed: expect.stringMatching(/^Quantities not computed: /)
			});
		} finally {
			delete process.env.ORTHOGON_CHEM_BUDGET_MS;
		}
	});

	it('carries the comment threads per step, the route thread and sanitised HTML', async () => {
		const copy = await open('viewer');
		const [thread] = copy.steps.find((s) => s.id === 'oxidise')!.threads;
		expect(thread!.root.html).toContain('<strong>TBS</strong>');
		expect(thread!.replies.map((r) => r.body)).toEqual(['Right, I meant DMP.']);
		expect(copy.steps.find((s) => s.id === 'reduce')!.threads).toEqual([]);
		expect(copy.routeThreads).toHaveLength(1);
		expect(copy.routeThreads[0]!.root.html).not.toMatch(/<script|javascript:/);
		expect(copy.threadsOnRemovedSteps.map((t) => t.root.body)).toEqual(['Old question.']);
	});

	it('states the approval and the history, and that the route changed since', async () => {
		let copy = await open('viewer');
		expect(copy.route.statusLabel).toBeTypeOf('string');
		expect(copy.approval).toMatchObject({
			version: 1,
			by: { name: 'Reviewer' },
			changedSince: false
		});
		expect(copy.history.map((e) => e.action)).toEqual(['request', 'approve']);
		const route = (await Route.findByPk(routeId))!;
		await saveRoute(f.people.chemist, route, route.version, document, f.team.id);
		copy = await open('viewer');
		expect(copy.approval).toMatchObject({ version: 1, changedSince: true });
		expect(copy.route.version).toBe(2);
	});
});
