import { beforeAll, describe, expect, it } from 'vitest';
import { verifyCredentials } from '../../src/lib/server/auth/credentials';
import { graphProblems } from '../../src/lib/route/document';
import { ActivityEvent, OutboxMessage, Project, Route, Team, User } from '../../src/lib/server/db';
import { listSavedConditions } from '../../src/lib/server/services/library';
import { checkSteps, rulesFor } from '../../src/lib/server/services/check';
import { listOverrides } from '../../src/lib/server/services/team-rules';
import { teamRuleLayer } from '../../src/lib/server/services/team-rules-layer';
import { listComments } from '../../src/lib/server/services/comments';
import { reviewHistory } from '../../src/lib/server/services/review';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { routeDocument } from '../../src/lib/server/services/routes';
import { seedDemoIfEmpty } from '../../src/lib/server/db/seed-demo';
import { listProjectsFor } from '../../src/lib/server/services/projects';
import { teamsOf } from '../../src/lib/server/services/teams';
import { freshDatabase } from '../factories';

beforeAll(freshDatabase);

describe('demo scenario', () => {
	it('seeds an empty database once, with the five documented sign-ins', async () => {
		expect(await seedDemoIfEmpty()).toBe(true);
		expect(await seedDemoIfEmpty()).toBe(false);
		const expected = {
			'lead@example.com': 'lead',
			'chemist@example.com': 'chemist',
			'reviewer@example.com': 'reviewer',
			'viewer@example.com': 'viewer',
			'outsider@example.com': 'lead'
		};
		for (const [email, role] of Object.entries(expected)) {
			const user = await verifyCredentials(email, 'orthogon-demo');
			expect(user, email).not.toBeNull();
			expect((await teamsOf(user!.id)).map((t) => t.role)).toEqual([role]);
			expect((await listProjectsFor(user!.id)).length).toBeGreaterThanOrEqual(1);
		}
		expect(await User.count()).toBe(5);
	});

	it('keeps the two teams apart', async () => {
		const lead = await verifyCredentials('lead@example.com', 'orthogon-demo');
		const outsider = await verifyCredentials('outsider@example.com', 'orthogon-demo');
		const leadTeams = (await listProjectsFor(lead!.id)).map((p) => p.teamId);
		const outsiderTeams = (await listProjectsFor(outsider!.id)).map((p) => p.teamId);
		expect(leadTeams.some((t) => outsiderTeams.includes(t))).toBe(false);
		expect(await Project.count()).toBe(3);
	});

	it("comes with routes to plan: alternatives with reasons, a convergent coupling, and one the planner calls impossible — Greene's; Clayden (from memory)", async () => {
		const routes = await Route.findAll({ order: [['name', 'ASC']] });
		expect(routes.map((r) => r.name)).toEqual([
			'OG-2031 aryl aldehyde — ethylene acetal',
			'OG-2031 keto ester — methyl addition',
			'OG-2031 side chain — first sketch',
			'OG-2044 amide coupling',
			'OG-3107 lactone core — side-chain addition'
		]);
		const planned = new Map<string, ReturnType<typeof planRouteDocument>>();
		for (const route of routes) {
			const document = await routeDocument(route);
			expect(graphProblems(document), route.name).toEqual([]);
			planned.set(route.name, planRouteDocument(document));
		}
		expect(
			planned.get('OG-2031 keto ester — methyl addition')!.plans[0]!.protections[0]!.group
		).toBe('ketone');
		expect(
			planned.get('OG-2031 side chain — first sketch')!.plans[0]!.rationale.join(' ')
		).toContain(
			'acetonide not used for the 1,2-diol: putting the acetonide on (2,2-dimethoxypropane, PPTS, acetone) would strip the dioxolane on the ketone'
		);
		// HATU acylates the amine, not the two alcohols (Montalbetti & Falque, Tetrahedron 2005, 61,
		// 10827 — from memory): judged reagent by reagent, the coupling needs no protection.
		expect(planned.get('OG-2044 amide coupling')!.plans[0]!).toMatchObject({
			addedSteps: 0,
			protections: []
		});
		expect(
			planned.get('OG-3107 lactone core — side-chain addition')!.unsolved![0]!.reason
		).toContain('no protecting group in the rule table masks a carboxylic ester');
	});

	it('stores the acetal demo step with its quantities and a trap log run in toluene (issue 14)', async () => {
		const route = await Route.findOne({
			where: { name: 'OG-2031 aryl aldehyde — ethylene acetal' }
		});
		const step = (await routeDocument(route!)).steps[0]!;
		expect(step.quantities?.map((m) => [m.name, m.role])).toEqual([
			['OG-2031-F aryl aldehyde', 'limiting'],
			['ethylene glycol', 'reagent'],
			['TsOH·H2O', 'catalyst'],
			['toluene', 'solvent'],
			['OG-2031-G dioxolane', 'product']
		]);
		expect(step.waterRemoval).toMatchObject({ solvent: 'toluene', trapCapacity: 10 });
		expect(step.waterRemoval!.log!.length).toBeGreaterThanOrEqual(4);
	});

	it('starts the amide coupling in review, with a question on its step and the chemist’s answer (issue 15)', async () => {
		const route = await Route.findOne({ where: { name: 'OG-2044 amide coupling' } });
		expect(route!.status).toBe('in-review');
		const [asked] = await reviewHistory(route!.id);
		expect(asked).toMatchObject({ action: 'request', actor: { name: 'Lena Marsh' } });
		expect(asked!.reviewers.map((person) => person.name)).toEqual(['Priya Vance']);
		const [question, answer] = await listComments(route!.id);
		expect(question).toMatchObject({ stepId: 'couple', author: { name: 'Priya Vance' } });
		expect(answer).toMatchObject({ replyTo: question!.id, author: { name: 'Tomas Ridley' } });
		// Real mails, queued like any other: the request to Priya, the comment to the author.
		const mails = await OutboxMessage.findAll({ attributes: ['to', 'subject'] });
		expect(mails.map((mail) => [mail.to, mail.subject])).toEqual(
			expect.arrayContaining([
				['reviewer@example.com', 'Review requested: “OG-2044 amide coupling”'],
				['lead@example.com', expect.stringMatching(/^New comment on “OG-2044 amide coupling”/)]
			])
		);
	});

	it('gives the process team a library: Tomas’s two TBS conditions approved by Lena, her dioxolane one awaiting approval (issue 16)', async () => {
		const aster = await Team.findOne({ where: { name: 'Aster Process Chemistry' } });
		const entries = await listSavedConditions([aster!.id], {});
		const summary = entries
			.map((e) => [e.protectingGroup, e.kind, e.author?.name, e.approved, e.uses])
			.sort(
				(a, b) =>
					String(a[0]).localeCompare(String(b[0])) || String(a[1]).localeCompare(String(b[1]))
			);
		expect(summary).toEqual([
			['dioxolane', 'install', 'Lena Marsh', false, 0],
			['TBS', 'install', 'Tomas Ridley', true, 0],
			['TBS', 'remove', 'Tomas Ridley', true, 0]
		]);
		// The reagents are read like any step's: TBAF with AcOH is buffered fluoride, milder on
		// base-sensitive groups than TBAF alone (Greene's, 5th ed., ch. 2; from memory).
		expect(entries.find((e) => e.kind === 'remove')!.conditions).toContain('fluoride-buffered');
		// Written and approved through the services, so the feed has them.
		const kinds = (await ActivityEvent.findAll({ where: { teamId: aster!.id } })).map(
			(a) => a.kind
		);
		expect(kinds.filter((k) => k === 'library.created')).toHaveLength(3);
		expect(kinds.filter((k) => k === 'library.approved')).toHaveLength(2);
		const fenwick = await Team.findOne({ where: { name: 'Fenwick Analogue Group' } });
		expect(await listSavedConditions([fenwick!.id], {})).toEqual([]);
	});

	it('gives the process team one rule of its own: TBAF only cautions a TBDPS ether (issue 16)', async () => {
		const aster = await Team.findOne({ where: { name: 'Aster Process Chemistry' } });
		expect(
			(await listOverrides(aster!.id)).map((o) => [o.subject, o.condition, o.reagent, o.rating])
		).toEqual([['TBDPS', 'fluoride', 'TBAF', 'caution']]);
		// The book rates TBDPS labile to fluoride (Greene's, 5th ed., ch. 2 — from memory); the
		// team's check says caution for TBAF and names its rule, and keeps the book for HF·pyridine.
		const tbdps = 'CC(C)(C)[Si](OCCCCO[Si](C)(C)C(C)(C)C)(c1ccccc1)c1ccccc1';
		const step = (reagents: string) => ({
			id: 's1',
			substrate: tbdps,
			product: 'CC(C)(C)[Si](OCCCCO)(c1ccccc1)c1ccccc1',
			reagents
		});
		const layer = await teamRuleLayer(aster!.id);
		const [withTbaf, withHf] = checkSteps(
			[step('TBAF, THF, 0 °C'), step('HF·pyridine, THF')],
			rulesFor(layer).rules
		);
		expect(withTbaf!.clashes.map((c) => c.severity)).toEqual(['caution']);
		expect(withTbaf!.clashes[0]!.message).toMatch(/^team rule: On the OG-series, TBAF/);
		expect(withHf!.clashes.some((c) => c.severity === 'clash')).toBe(true);
		const fenwick = await Team.findOne({ where: { name: 'Fenwick Analogue Group' } });
		expect(await teamRuleLayer(fenwick!.id)).toBeUndefined();
	});

	it('rejects a wrong password', async () => {
		expect(await verifyCredentials('lead@example.com', 'wrong-password')).toBeNull();
		expect(await verifyCredentials('nobody@example.com', 'orthogon-demo')).toBeNull();
	});
});
