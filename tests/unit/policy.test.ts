import { describe, expect, it } from 'vitest';
import { ACTIONS, can, ROLES, type Action, type Role } from '../../src/lib/policy';

// Expected grants written out from the role descriptions in shared/DESIGN.md ("Roles"):
// lead manages the team and approves library entries and does all chemist work; chemist edits
// routes and adds library entries; reviewer reads, comments, approves or asks for changes; viewer reads.
const EXPECTED: Record<Role, Action[]> = {
	lead: [...ACTIONS],
	chemist: [
		'project.read',
		'project.create',
		'project.edit',
		'route.edit',
		'route.comment',
		'library.add'
	],
	reviewer: ['project.read', 'route.comment', 'route.review'],
	viewer: ['project.read']
};

describe('role × action policy', () => {
	for (const role of ROLES) {
		for (const action of ACTIONS) {
			const allowed = EXPECTED[role].includes(action);
			it(`${role} ${allowed ? 'may' : 'may not'} ${action}`, () => {
				expect(can(role, action)).toBe(allowed);
			});
		}
	}

	it('grants nothing without a role', () => {
		for (const action of ACTIONS) {
			expect(can(null, action)).toBe(false);
		}
	});

	it('keeps reviewers from editing structures (DESIGN.md: "cannot edit structures")', () => {
		expect(can('reviewer', 'route.edit')).toBe(false);
	});
});
