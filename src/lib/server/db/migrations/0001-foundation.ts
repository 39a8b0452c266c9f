import { DataTypes, type QueryInterface } from 'sequelize';

// Dialect-neutral on purpose: only QueryInterface calls and Sequelize types, so the same file
// builds the schema on SQLite and PostgreSQL.
const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const timestamps = {
	createdAt: { type: DataTypes.DATE, allowNull: false },
	updatedAt: { type: DataTypes.DATE, allowNull: false }
};
const ref = (table: string, onDelete: 'CASCADE' | 'SET NULL', allowNull = false) => ({
	type: DataTypes.UUID,
	allowNull,
	references: { model: table, key: 'id' },
	onDelete
});

export async function up(qi: QueryInterface) {
	await qi.createTable('users', {
		id,
		email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
		name: { type: DataTypes.STRING(120), allowNull: false },
		passwordHash: { type: DataTypes.STRING(100), allowNull: true },
		...timestamps
	});
	await qi.createTable('teams', {
		id,
		name: { type: DataTypes.STRING(120), allowNull: false },
		...timestamps
	});
	await qi.createTable('memberships', {
		id,
		userId: ref('users', 'CASCADE'),
		teamId: ref('teams', 'CASCADE'),
		role: { type: DataTypes.STRING(16), allowNull: false },
		...timestamps
	});
	await qi.addIndex('memberships', ['userId', 'teamId'], { unique: true });
	await qi.addIndex('memberships', ['teamId']);

	await qi.createTable('api_tokens', {
		id,
		userId: ref('users', 'CASCADE'),
		label: { type: DataTypes.STRING(80), allowNull: false },
		tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
		prefix: { type: DataTypes.STRING(16), allowNull: false },
		lastUsedAt: { type: DataTypes.DATE, allowNull: true },
		revokedAt: { type: DataTypes.DATE, allowNull: true },
		...timestamps
	});
	await qi.addIndex('api_tokens', ['userId']);

	await qi.createTable('set_password_links', {
		id,
		userId: ref('users', 'CASCADE'),
		tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
		expiresAt: { type: DataTypes.DATE, allowNull: false },
		usedAt: { type: DataTypes.DATE, allowNull: true },
		...timestamps
	});

	await qi.createTable('projects', {
		id,
		teamId: ref('teams', 'CASCADE'),
		name: { type: DataTypes.STRING(120), allowNull: false },
		description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		createdById: ref('users', 'SET NULL', true),
		archivedAt: { type: DataTypes.DATE, allowNull: true },
		...timestamps
	});
	await qi.addIndex('projects', ['teamId']);

	await qi.createTable('activity_events', {
		id,
		teamId: ref('teams', 'CASCADE'),
		projectId: ref('projects', 'CASCADE', true),
		// Routes arrive in a later migration; the column waits here without a foreign key.
		routeId: { type: DataTypes.UUID, allowNull: true },
		actorId: ref('users', 'SET NULL', true),
		kind: { type: DataTypes.STRING(48), allowNull: false },
		summary: { type: DataTypes.STRING(500), allowNull: false },
		details: { type: DataTypes.JSON, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('activity_events', ['teamId', 'createdAt']);
	await qi.addIndex('activity_events', ['projectId', 'createdAt']);
}

export async function down(qi: QueryInterface) {
	for (const table of [
		'activity_events',
		'projects',
		'set_password_links',
		'api_tokens',
		'memberships',
		'teams',
		'users'
	]) {
		await qi.dropTable(table);
	}
}
