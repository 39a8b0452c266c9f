import { DataTypes, type QueryInterface } from 'sequelize';

// Which route a saved plan came from, and which of its ranked plans it was. A table of its own
// rather than a column on `routes`: SQLite drops a column by rebuilding the table, and dropping
// `routes` with foreign keys on would cascade into every intermediate and step, so `down` could
// not be honest. Dropping this table leaves the routes untouched.
export async function up(qi: QueryInterface) {
	await qi.createTable('planned_routes', {
		id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
		routeId: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'routes', key: 'id' },
			onDelete: 'CASCADE'
		},
		// The original may go while the planned route stays; the link then reads "planned from a
		// route that no longer exists" rather than taking the planned route with it.
		plannedFromId: {
			type: DataTypes.UUID,
			allowNull: true,
			references: { model: 'routes', key: 'id' },
			onDelete: 'SET NULL'
		},
		rank: { type: DataTypes.INTEGER, allowNull: false },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('planned_routes', ['routeId'], { unique: true });
	await qi.addIndex('planned_routes', ['plannedFromId']);
}

export async function down(qi: QueryInterface) {
	await qi.dropTable('planned_routes');
}
