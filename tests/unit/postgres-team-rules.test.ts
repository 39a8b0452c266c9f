import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { ApiFailure } from '../../src/lib/server/api';
import { closeDatabase, dbReady, openDatabase, TeamRuleOverride } from '../../src/lib/server/db';
import { createSequelize } from '../../src/lib/server/db/connection';
import { addOverride } from '../../src/lib/server/services/team-rules';
import { join, makeTeam, makeUser } from '../factories';

// Team rule overrides on PostgreSQL, where parallel requests run in transactions of their own as
// several servers would: the same cell sent at once is stored once, and every other request is
// told so (409). `npm test` provides the throwaway server (scripts/test-postgres.js).
const url = process.env.TEST_POSTGRES_URL;
const database = `orthogon_team_rules_${randomBytes(4).toString('hex')}`;

describe.skipIf(!url)('team rule overrides on PostgreSQL', () => {
	const admin = url ? createSequelize(url) : null;

	afterAll(async () => {
		await closeDatabase();
		await admin?.query(`DROP DATABASE IF EXISTS ${database}`);
		await admin?.close();
	});

	it('stores one override when eight leads set the same cell at once', async () => {
		await admin!.query(`CREATE DATABASE ${database}`);
		await closeDatabase();
		openDatabase(url!.replace(/\/[^/]+$/, `/${database}`));
		await dbReady();
		const team = await makeTeam();
		const lead = await makeUser('Lead');
		await join(lead, team.id, 'lead');
		const body = {
			subject: 'TBS',
			condition: 'lewis-acid' as const,
			rating: 'labile',
			reason: 'Lost with BF3·OEt2 on our diols.',
			source: 'Notebook OG-12, p. 40'
		};
		const outcomes = await Promise.all(
			Array.from({ length: 8 }, () =>
				addOverride(lead, team.id, body).then(
					() => 'stored',
					(caught: unknown) => (caught instanceof ApiFailure ? caught.code : String(caught))
				)
			)
		);
		expect(outcomes.sort()).toEqual([...Array<string>(7).fill('override_exists'), 'stored']);
		expect(await TeamRuleOverride.count({ where: { teamId: team.id } })).toBe(1);
	}, 60_000);
});
