import { describe, expect, it } from 'vitest';
import { checkRouteDocument } from '../../src/lib/server/services/check';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { line } from '../factories/plan-routes';

// Caution-level needs: a free group that a step only threatens (rated `caution`, not `reacts`).
// The planner offers to mask it and says why, and never answers "nothing needs masking" while
// the check shows such cautions. Where chemists usually mask (rules/reactivity.json
// `usuallyMasked`), the first plans mask it; otherwise the first plan leaves it free.

const masks = (plan: { protections: { group: string }[] }) => plan.protections.map((p) => p.group);
const said = (answer: ReturnType<typeof planRouteDocument>) =>
	answer.plans.flatMap((p) => p.rationale).join(' ');

describe('caution-level needs', () => {
	it("masks a primary amine before a double Grignard addition to an ester, and offers leaving it free last — Clayden, Greeves & Warren, 2nd ed., N–H quenches organometallics; Greene's, amine protection (from memory)", () => {
		const route = line(['NCCCC(=O)OC', 'NCCCC(C)(C)O'], ['MeMgBr (3 equiv), THF']);
		// The check shows the caution on the route as drawn.
		const check = checkRouteDocument(route)[0]!;
		expect(check.clashes.map((c) => `${c.severity} ${c.subject}`)).toContain(
			'caution amine-primary'
		);
		const answer = planRouteDocument(route);
		expect(answer.plans.length).toBeGreaterThan(1);
		expect(masks(answer.plans[0]!)).toEqual(['amine-primary']);
		expect(answer.plans[0]!.rationale.join(' ')).toMatch(/only a caution .*MeMgBr.*N–H/);
		const last = answer.plans.at(-1)!;
		expect(last.protections).toEqual([]);
		expect(last.rationale[0]).toMatch(
			/^Leaves the free primary alkylamine as it is, accepting a caution \(MeMgBr/
		);
		expect(last.rationale.at(-1)).toMatch(
			/^Ranked below plan \d: it leaves the free primary alkylamine unmasked, where chemists usually mask it/
		);
		expect(said(answer)).not.toContain('nothing needs masking');
	});

	it('masks the amine of an amino alcohol before a Swern oxidation — Garner & Park, J. Org. Chem. 1987, 52, 2361 (the N-Boc amino alcohol is oxidised, not the free amine); common practice: free amino aldehydes self-condense', () => {
		const answer = planRouteDocument(line(['NCCCCO', 'NCCCC=O'], ['(COCl)2, DMSO, Et3N']));
		expect(masks(answer.plans[0]!)).toEqual(['amine-primary']);
		expect(answer.plans.at(-1)!.protections).toEqual([]);
		expect(said(answer)).not.toContain('nothing needs masking');
	});

	it('leaves a secondary alcohol free through a LiAlH4 ester reduction first, and offers a silyl ether after — common practice: the O–H only consumes an extra equivalent of hydride', () => {
		const answer = planRouteDocument(
			line(['C[C@H](O)CCC(=O)OC', 'C[C@H](O)CCCO'], ['LiAlH4, THF'])
		);
		expect(answer.plans[0]!.protections).toEqual([]);
		expect(answer.plans[0]!.rationale).toEqual([
			'Plan 1 comes first: plan 2 adds steps to mask the secondary alcohol as well, which the rule table rates only a caution.',
			expect.stringMatching(
				/^Leaves the free secondary alcohol as it is, accepting a caution \(LiAlH4 in step "s1" \(LiAlH4, THF\): The O–H consumes hydride/
			)
		]);
		const masked = answer.plans.slice(1);
		expect(masked.length).toBeGreaterThan(0);
		for (const plan of masked) {
			expect(masks(plan)).toEqual(['alcohol-secondary']);
		}
		expect(said(answer)).not.toContain('nothing needs masking');
	});

	it('still says nothing needs masking where the check shows no caution at all — common practice: a primary alcohol stands by a Pd/C hydrogenation of an alkene', () => {
		const route = line(['OCCCCC=C', 'OCCCCCC'], ['H2, Pd/C, EtOAc']);
		expect(checkRouteDocument(route)[0]!.clashes).toEqual([]);
		const answer = planRouteDocument(route);
		expect(answer.plans).toHaveLength(1);
		expect(answer.plans[0]!.rationale).toEqual([
			'No step attacks a free group that stands by: nothing needs masking.'
		]);
	});

	it('leaves a ketone free through a hydrogenation and says which caution it accepts — Rylander, Catalytic Hydrogenation in Organic Syntheses (1979): aliphatic ketones survive Pd/C at 1 atm (from memory)', () => {
		const answer = planRouteDocument(line(['CC(=O)CCCC=C', 'CC(=O)CCCCC'], ['H2, Pd/C, EtOAc']));
		expect(answer.plans[0]!.protections).toEqual([]);
		expect(answer.plans[0]!.rationale.join(' ')).toMatch(
			/Leaves the free ketone as it is, accepting a caution/
		);
		expect(said(answer)).not.toContain('nothing needs masking');
	});
});
