import { isHttpError, isRedirect, type RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { load } from '../../src/routes/routes/[routeId=uuid]/+page.server';
import { readFileSync } from 'node:fs';
import { createRoute } from '../../src/lib/server/services/routes';
import { Comment, Intermediate, ReviewEvent, Route, type Project } from '../../src/lib/server/db';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
let routeId = '';
type Who = keyof typeof f.people;

async function open(who: Who | null, id = routeId) {
	const event = fakeEvent({
		user: who ? f.people[who] : null,
		path: `/routes/${id}`
	}) as RequestEvent & { params: Record<string, string> };
	event.params = { routeId: id };
	return (load as unknown as (e: RequestEvent) => Promise<Record<string, unknown>>)(event);
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Cormorant page test');
	const route = await createRoute(f.people.chemist, project, {
		name: 'OG-2031 page',
		intermediates: [
			{ id: 'a', structure: 'CC(=O)CCC(=O)OC' },
			{ id: 'x', structure: 'C1CC' }
		],
		steps: [{ id: 's1', from: ['a'], to: 'x' }]
	});
	routeId = route.id;
});

describe('the route map page load', () => {
	it('gives every role of the team the document and server depictions, and editing only to chemists and leads', async () => {
		for (const [who, canEdit] of [
			['lead', true],
			['chemist', true],
			['reviewer', false],
			['viewer', false]
		] as const) {
			const data = await open(who);
			expect(data.canEdit, who).toBe(canEdit);
			expect((data.document as { name: string }).name).toBe('OG-2031 page');
			const analyses = data.analyses as Record<string, { svg?: string; groups: { id: string }[] }>;
			expect(analyses['CC(=O)CCC(=O)OC']!.svg).toContain('<svg');
			expect(analyses['CC(=O)CCC(=O)OC']!.groups.map((g) => g.id)).toContain('ketone');
			// An unreadable stored structure is left to its node to explain, not a failed page.
			expect(analyses['C1CC']).toBeUndefined();
		}
	});

	it('opens a route stored before the limits with the killer molfile in it (issue 10, defect 1)', async () => {
		// Written straight to the database, as an older version let a save do.
		const killer = readFileSync(
			new URL('../fixtures/declares-99999999-atoms-v3000.mol', import.meta.url),
			'utf8'
		);
		const old = await Route.create({
			projectId: project.id,
			name: 'Stored before the limits',
			createdById: f.people.chemist.id,
			archivedAt: null
		});
		for (const [ordinal, structure] of [killer, 'OCCO'].entries()) {
			await Intermediate.create({
				routeId: old.id,
				key: `n${ordinal}`,
				label: null,
				structure,
				canonical: null,
				positionX: null,
				positionY: null,
				ordinal
			});
		}
		const data = await open('viewer', old.id);
		const analyses = data.analyses as Record<string, { svg?: string }>;
		expect(analyses['OCCO']!.svg).toContain('<svg');
		expect(analyses[killer]).toBeUndefined(); // its node asks /api/analyze and shows the 422
	});

	it('comes without drawings, not late, when the page budget runs out', async () => {
		process.env.ORTHOGON_CHEM_PAGE_BUDGET_MS = '1';
		try {
			const data = await open('viewer');
			expect(data.analyses).toEqual({});
			expect((data.document as { name: string }).name).toBe('OG-2031 page');
		} finally {
			delete process.env.ORTHOGON_CHEM_PAGE_BUDGET_MS;
		}
	});

	it('answers 404 to another team and to an unknown id, and sends visitors to sign in', async () => {
		for (const attempt of [
			() => open('outsider'),
			() => open('lead', '00000000-0000-4000-8000-000000000000'),
			() => open('lead', 'not-a-uuid')
		]) {
			const caught = await attempt().catch((e: unknown) => e);
			expect(isHttpError(caught) && caught.status).toBe(404);
		}
		const visitor = await open(null).catch((e: unknown) => e);
		expect(isRedirect(visitor) && visitor.location).toMatch(/^\/signin\?redirectTo=/);
	});
});

describe('the route map labels sent with the page load (instead of two downloads of /api/rules)', () => {
	it('names condition classes, free groups and protecting groups as the rule files do', async () => {
		const { labels } = (await open('viewer')) as {
			labels: {
				conditions: { id: string; label: string }[];
				groups: Map<string, string>;
				protectingGroups: Map<string, string>;
			};
		};
		// rules/conditions.json, rules/groups.json and rules/protecting-groups.json.
		expect(labels.conditions).toContainEqual({ id: 'acid-strong', label: 'Strong acid' });
		expect(labels.groups.get('ester')).toBe('carboxylic ester');
		expect(labels.protectingGroups.get('TBS')).toMatch(/silyl/i);
		// Only the names: none of the ratings, descriptions or patterns the rule table holds.
		expect(Object.keys(labels.conditions[0]!).sort()).toEqual(['id', 'label']);
	});
});

describe('the review data sent with the page load (issue 15)', () => {
	it('brings the comments, the history, the approved version and who may review, with each role’s rights', async () => {
		const route = await createRoute(f.people.chemist, project, {
			name: 'Reviewed route',
			intermediates: [
				{ id: 'a', structure: 'OCCO' },
				{ id: 'b', structure: 'OCCOC' }
			],
			steps: [{ id: 's1', from: ['a'], to: 'b' }]
		});
		const question = await Comment.create({
			routeId: route.id,
			stepKey: 's1',
			replyToId: null,
			authorId: f.people.reviewer.id,
			body: 'Why **NaH** here?',
			editedAt: null
		});
		await ReviewEvent.create({
			routeId: route.id,
			actorId: f.people.chemist.id,
			action: 'request',
			reviewerIds: [f.people.reviewer.id],
			note: null,
			version: 1
		});
		await ReviewEvent.create({
			routeId: route.id,
			actorId: f.people.reviewer.id,
			action: 'approve',
			reviewerIds: null,
			note: 'Fine.',
			version: 1
		});
		for (const [who, rights] of [
			['lead', { canComment: true, canReview: true, canRequest: true }],
			['chemist', { canComment: true, canReview: false, canRequest: true }],
			['reviewer', { canComment: true, canReview: true, canRequest: false }],
			['viewer', { canComment: false, canReview: false, canRequest: false }]
		] as const) {
			const data = await open(who, route.id);
			expect({
				canComment: data.canComment,
				canReview: data.canReview,
				canRequest: data.canRequest
			}).toEqual(rights);
			expect(data.userId).toBe(f.people[who].id);
			const comments = data.comments as { id: string; stepId: string; html: string }[];
			expect(comments.map((c) => [c.id, c.stepId])).toEqual([[question.id, 's1']]);
			expect(comments[0]!.html).toContain('<strong>NaH</strong>');
			const history = data.history as { action: string; reviewers: { name: string }[] }[];
			expect(history.map((h) => h.action)).toEqual(['request', 'approve']);
			expect(history[0]!.reviewers.map((r) => r.name)).toEqual(['Reviewer']);
			expect(data.approvedVersion).toBe(1);
			// Those whose role may review (lead, reviewer), with the e-mail the request names them by.
			const reviewers = data.reviewers as { name: string; email: string }[];
			expect(reviewers.map((r) => r.name)).toEqual(['Lead', 'Reviewer']);
			expect(reviewers.every((r) => r.email.includes('@'))).toBe(true);
		}
	});

	it('says a route that was never approved has no approved version, and has no comments yet', async () => {
		const data = await open('viewer');
		expect(data.approvedVersion).toBeNull();
		expect(data.comments).toEqual([]);
		expect(data.history).toEqual([]);
	});
});
