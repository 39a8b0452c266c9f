import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from './migrations';

function umzugFor(sequelize: Sequelize) {
	const qi = sequelize.getQueryInterface();
	return new Umzug({
		migrations: migrations.map((m) => ({
			name: m.name,
			up: () => m.up(qi),
			down: () => m.down(qi)
		})),
		context: qi,
		storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
		logger: undefined
	});
}

// Any fixed 64-bit number works; this one spells "orthogon" in ASCII, so it is easy to spot in
// pg_locks. Every server takes the same lock.
const MIGRATION_LOCK_KEY = '8030609077449486190';

/**
 * Applies every pending migration; returns the names applied, e.g. `['0001-foundation']`.
 * On PostgreSQL several servers may start at once: each waits for a transaction-scoped advisory
 * lock first, so one applies the migrations and the others then find nothing pending. The lock
 * ends with the transaction, even when a server dies halfway. SQLite serves one server only.
 */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
	if (sequelize.getDialect() !== 'postgres') {
		return applyPending(sequelize);
	}
	return sequelize.transaction(async (transaction) => {
		await sequelize.query('SELECT pg_advisory_xact_lock(:key)', {
			replacements: { key: MIGRATION_LOCK_KEY },
			transaction
		});
		return applyPending(sequelize);
	});
}

async function applyPending(sequelize: Sequelize): Promise<string[]> {
	const applied = await umzugFor(sequelize).up();
	return applied.map((m) => m.name);
}

/** Rolls back every migration (tests and the reversibility check use it). */
export async function migrateDownAll(sequelize: Sequelize): Promise<void> {
	await umzugFor(sequelize).down({ to: 0 });
}
