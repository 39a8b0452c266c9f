import { isHttpError } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import * as projectPage from '../../src/routes/projects/[projectId=uuid]/+page.server';
import { closeDatabase, dbReady, openDatabase } from '../../src/lib/server/db';
import { migrateDownAll } from '../../src/lib/server/db/migrate';
import { seedDemoIfEmpty } from '../../src/lib/server/db/seed-demo';
import { verifyCredentials } from '../../src/lib/server/auth/credentials';
import { createProject, listProjectsFor } from '../../src/lib/server/services/projects';
import { teamsOf } from '../../src/lib/server/services/teams';
import { createRoute, saveRoute, VersionConflict } from '../../src/lib/server/services/routes';
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
		const project = await createProject(lead!, {
			teamId: team!.id,
			name: 'Postgres probe',
			description: ''
		});
		expect((await listProjectsFor(lead!.id)).map((p) => p.id)).toContain(project.id);
		expect((await recentActivity({ teamId: team!.id }, 1))[0]!.summary).toContain('Postgres probe');
		// Parallel saves of different routes all land; of ten saves at one version, one wins and
		// every other is a VersionConflict (409): the same code path as on SQLite.
		const doc = (name: string) => ({
			name,
			intermediates: [{ id: 'a', structure: 'CCO' }],
			steps: []
		});
		const routes = await Promise.all(
			Array.from({ length: 10 }, (_, i) => createRoute(lead!, project, doc(`PG ${i}`)))
		);
		const saved = await Promise.allSettled(
			routes.map((r, i) => saveRoute(lead!, r, 1, doc(`PG ${i}, revised`), team!.id))
		);
		expect(saved.filter((r) => r.status === 'rejected')).toEqual([]);
		const contested = await Promise.allSettled(
			Array.from({ length: 10 }, (_, i) =>
				saveRoute(lead!, routes[0]!, 2, doc(`Edit ${i}`), team!.id)
			)
		);
		expect(contested.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
		for (const r of contested) {
			if (r.status === 'rejected') {
				expect(r.reason).toBeInstanceOf(VersionConflict);
			}
		}
		// A form's route id that is not a uuid is a 404, not PostgreSQL's invalid-uuid error (500).
		const actionUrl = new URL(`http://localhost/projects/${project.id}?/archiveRoute`);
		const request = new Request(actionUrl, {
			method: 'POST',
			body: new URLSearchParams({ routeId: 'abc' })
		});
		const event = {
			url: actionUrl,
			request,
			params: { projectId: project.id },
			locals: { user: lead, via: 'session' }
		};
		const refused = await (projectPage.actions.archiveRoute as (e: unknown) => Promise<unknown>)(
			event
		).catch((e: unknown) => e);
		expect(isHttpError(refused) && refused.status).toBe(404);
		await migrateDownAll(sequelize);
		expect(
			(await sequelize.getQueryInterface().showAllTables()).filter((t) => t !== 'schema_migrations')
		).toEqual([]);
		await closeDatabase();
	}, 30_000);
});
