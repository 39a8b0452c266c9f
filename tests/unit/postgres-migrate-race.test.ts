import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { createSequelize } from '../../src/lib/server/db/connection';
import { migrate } from '../../src/lib/server/db/migrate';
import { migrations } from '../../src/lib/server/db/migrations';

// Two servers starting at once on one PostgreSQL both run the migrations. `npm test` provides the
// throwaway server (scripts/test-postgres.js); this suite uses a database of its own on it, so it
// cannot disturb the dialect test running beside it.
const url = process.env.TEST_POSTGRES_URL;
const database = `orthogon_race_${randomBytes(4).toString('hex')}`;

describe.skipIf(!url)('migrations when two servers start at once (PostgreSQL)', () => {
	const admin = url ? createSequelize(url) : null;

	afterAll(async () => {
		await admin?.query(`DROP DATABASE IF EXISTS ${database}`);
		await admin?.close();
	});

	it('applies every migration exactly once, and both servers come up', async () => {
		await admin!.query(`CREATE DATABASE ${database}`);
		const raceUrl = url!.replace(/\/[^/]+$/, `/${database}`);
		const servers = [createSequelize(raceUrl), createSequelize(raceUrl)];
		try {
			const applied = await Promise.all(servers.map((s) => migrate(s)));
			expect(applied.flat().sort()).toEqual(migrations.map((m) => m.name).sort());
			const [rows] = await servers[0]!.query('SELECT name FROM schema_migrations');
			expect(rows).toHaveLength(migrations.length);
		} finally {
			await Promise.all(servers.map((s) => s.close()));
		}
	}, 60_000);
});
