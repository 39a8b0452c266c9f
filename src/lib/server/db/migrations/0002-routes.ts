import { DataTypes, type QueryInterface } from 'sequelize';

// Routes, their intermediates and steps. Children keep the client's own ids in `key` so the
// route document round-trips unchanged; `ordinal` keeps the document's order.
const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const timestamps = {
	createdAt: { type: DataTypes.DATE, allowNull: false },
	updatedAt: { type: DataTypes.DATE, allowNull: false }
};
const routeRef = {
	type: DataTypes.UUID,
	allowNull: false,
	references: { model: 'routes', key: 'id' },
	onDelete: 'CASCADE'
};

export async function up(qi: QueryInterface) {
	await qi.createTable('routes', {
		id,
		projectId: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'projects', key: 'id' },
			onDelete: 'CASCADE'
		},
		name: { type: DataTypes.STRING(120), allowNull: false },
		status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
		version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
		createdById: {
			type: DataTypes.UUID,
			allowNull: true,
			references: { model: 'users', key: 'id' },
			onDelete: 'SET NULL'
		},
		archivedAt: { type: DataTypes.DATE, allowNull: true },
		...timestamps
	});
	await qi.addIndex('routes', ['projectId']);

	await qi.createTable('intermediates', {
		id,
		routeId: routeRef,
		key: { type: DataTypes.STRING(64), allowNull: false },
		label: { type: DataTypes.STRING(120), allowNull: true },
		structure: { type: DataTypes.TEXT, allowNull: false },
		canonical: { type: DataTypes.TEXT, allowNull: true },
		positionX: { type: DataTypes.DOUBLE, allowNull: true },
		positionY: { type: DataTypes.DOUBLE, allowNull: true },
		ordinal: { type: DataTypes.INTEGER, allowNull: false },
		...timestamps
	});
	await qi.addIndex('intermediates', ['routeId', 'key'], { unique: true });

	await qi.createTable('steps', {
		id,
		routeId: routeRef,
		key: { type: DataTypes.STRING(64), allowNull: false },
		fromKeys: { type: DataTypes.JSON, allowNull: false },
		toKey: { type: DataTypes.STRING(64), allowNull: false },
		reagents: { type: DataTypes.TEXT, allowNull: true },
		conditionIds: { type: DataTypes.JSON, allowNull: true },
		notes: { type: DataTypes.TEXT, allowNull: true },
		quantities: { type: DataTypes.JSON, allowNull: true },
		intent: { type: DataTypes.STRING(16), allowNull: true },
		ordinal: { type: DataTypes.INTEGER, allowNull: false },
		...timestamps
	});
	await qi.addIndex('steps', ['routeId', 'key'], { unique: true });
}

export async function down(qi: QueryInterface) {
	await qi.dropTable('steps');
	await qi.dropTable('intermediates');
	await qi.dropTable('routes');
}
