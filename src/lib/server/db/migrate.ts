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

/** Applies every pending migration; returns the names applied, e.g. `['0001-foundation']`. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
	const applied = await umzugFor(sequelize).up();
	return applied.map((m) => m.name);
}

/** Rolls back every migration (tests and the reversibility check use it). */
export async function migrateDownAll(sequelize: Sequelize): Promise<void> {
	await umzugFor(sequelize).down({ to: 0 });
}
