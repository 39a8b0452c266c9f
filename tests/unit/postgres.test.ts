import { describe, expect, it } from 'vitest';
import { closeDatabase, dbReady, openDatabase } from '../../src/lib/server/db';
import { migrateDownAll } from '../../src/lib/server/db/migrate';
import { seedDemoIfEmpty } from '../../src/lib/server/db/seed-demo';
import { verifyCredentials } from '../../src/lib/server/auth/credentials';
import { createProject, listProjectsFor } from '../../src/lib/server/services/projects';
import { teamsOf } from '../../src/lib/server/services/teams';
import { recentActivity } from '../../src/lib/server/services/activity';

// `npm test` starts a throwaway PostgreSQL (scripts/test-postgres.js) when Debian's postgresql
// package is installed, as CI does; elsewhere this suite is skipped and the runner says why.
const url = process.env.TEST_POSTGRES_URL;

describe.skipIf(!url)('the same models and migrations on PostgreSQL', () => {
	it('migrate, seed, query, write and roll back', async () => {
		await closeDatabase();
		const { sequelize } = openDatabase(url!);
		await dbReady();
		expect(sequelize.getDialect()).toBe('postgres');
		expect(await seedDemoIfEmpty()).toBe(true);
		const lead = await verifyCredentials('lead@example.com', 'orthogon-demo');
		expect(lead).not.toBeNull();
		const [team] = await teamsOf(lead!.id);
		expect(team!.role).toBe('lead');
		const project = await createProject(lead!, { teamId: team!.id, name: 'Postgres probe', description: '' });
		expect((await listProjectsFor(lead!.id)).map((p) => p.id)).toContain(project.id);
		expect((await recentActivity({ teamId: team!.id }, 1))[0]!.summary).toContain('Postgres probe');
		await migrateDownAll(sequelize);
		expect((await sequelize.getQueryInterface().showAllTables()).filter((t) => t !== 'schema_migrations')).toEqual([]);
		await closeDatabase();
	}, 30_000);
});
