import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, dbReady, openDatabase } from '../../src/lib/server/db';
import { createSequelize } from '../../src/lib/server/db/connection';
import { join, makeProject, makeTeam, makeUser } from '../factories';
import { approvalsAgainstSaves, parallelVerdicts } from '../factories/review-races';

// Review actions on PostgreSQL, where parallel transactions really run side by side on their own
// connections (as several servers would). `npm test` provides the throwaway server
// (scripts/test-postgres.js); this suite uses a database of its own on it.
// Source of the expectations: the issue 15 contract (one status change wins; approvals name
// the version they saw).
const url = process.env.TEST_POSTGRES_URL;
const database = `orthogon_review_${randomBytes(4).toString('hex')}`;

describe.skipIf(!url)('review actions on PostgreSQL', () => {
	const admin = url ? createSequelize(url) : null;

	afterAll(async () => {
		await closeDatabase();
		await admin?.query(`DROP DATABASE IF EXISTS ${database}`);
		await admin?.close();
	});

	it('moves a status once under parallel verdicts and never approves an unseen edit', async () => {
		await admin!.query(`CREATE DATABASE ${database}`);
		await closeDatabase();
		openDatabase(url!.replace(/\/[^/]+$/, `/${database}`));
		await dbReady();
		const team = await makeTeam();
		const people = {
			chemist: await makeUser('Chemist'),
			reviewer: await makeUser('Reviewer'),
			lead: await makeUser('Lead')
		};
		for (const role of ['chemist', 'reviewer', 'lead'] as const) {
			await join(people[role], team.id, role);
		}
		const project = await makeProject(team.id);

		const verdicts = await parallelVerdicts(people, project, 10);
		expect(verdicts).toEqual({
			passed: 1,
			refusals: Array(9).fill('invalid_transition'),
			events: 1
		});
		for (const withVersion of [true, false]) {
			const outcomes = await approvalsAgainstSaves(people, project, 8, withVersion);
			for (const outcome of outcomes) {
				expect(outcome.version).toBe(2);
				if (outcome.status === 'approved') {
					expect(outcome.approvedVersion).toBe(2);
				}
			}
		}
	}, 60_000);
});
