import { beforeAll, describe, expect, it } from 'vitest';
import { verifyCredentials } from '../../src/lib/server/auth/credentials';
import { Project, User } from '../../src/lib/server/db';
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

	it('rejects a wrong password', async () => {
		expect(await verifyCredentials('lead@example.com', 'wrong-password')).toBeNull();
		expect(await verifyCredentials('nobody@example.com', 'orthogon-demo')).toBeNull();
	});
});
