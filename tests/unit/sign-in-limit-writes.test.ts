import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join as joinPath } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase, dbReady, openDatabase, Team, User } from '../../src/lib/server/db';
import { takeSignInAttempt } from '../../src/lib/server/auth/rate-limit';

// A file database, where Sequelize gives each transaction its own connection. The sign-in limiter
// counts inside a SAVEPOINT; on Sequelize's shared connection that met a transaction holding the
// write lock, stalled the queries behind it, and could leave the SAVEPOINT open, after which every
// write in the process waited and failed (seen as sign-ins and team changes timing out together).
const dir = mkdtempSync(joinPath(tmpdir(), 'orthogon-limits-'));

beforeAll(async () => {
	await closeDatabase();
	openDatabase(`sqlite:${joinPath(dir, 'limits.db')}`);
	await dbReady();
});

afterAll(async () => {
	await closeDatabase();
	rmSync(dir, { recursive: true, force: true });
});

describe('sign-in counts beside a running write transaction', () => {
	it('wait their turn instead of fighting for the lock, and leave every later write working', async () => {
		const sequelize = User.sequelize!;
		const order: string[] = [];
		let attempt: Promise<unknown> | null = null;
		await sequelize.transaction(async (transaction) => {
			await Team.create({ name: 'Holding the lock' }, { transaction });
			attempt = takeSignInAttempt('someone@example.com', '203.0.113.7').then((verdict) => {
				order.push('attempt counted');
				return verdict;
			});
			await new Promise((resolve) => setTimeout(resolve, 100));
			// A read outside the transaction, on the connection the limiter used to share.
			await User.count();
			order.push('transaction done');
		});
		expect(await attempt).toEqual({ allowed: true });
		expect(order).toEqual(['transaction done', 'attempt counted']);
		// Nothing is left holding the lock: ordinary writes go on.
		await Promise.all(
			Array.from({ length: 5 }, (_, i) =>
				sequelize.transaction((transaction) => Team.create({ name: `After ${i}` }, { transaction }))
			)
		);
		expect(await Team.count()).toBe(6);
	});
});
