import { DataTypes, type QueryInterface } from 'sequelize';

// Two tables that let several app servers on one database act as one:
// `sessions`: one row per signed-in browser. The session cookie (a JWT) names its row, and a
// request counts as signed in only while the row exists, so signing out or changing the password
// ends a session on every server at once.
// `sign_in_limits`: the failed sign-in counts, in the column layout rate-limiter-flexible's SQL
// stores read and write (key, points, expire in epoch milliseconds; the column order matters to
// its PostgreSQL INSERT), so every server counts against the same numbers.
export async function up(qi: QueryInterface) {
	await qi.createTable('sessions', {
		id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
		userId: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'users', key: 'id' },
			onDelete: 'CASCADE'
		},
		expiresAt: { type: DataTypes.DATE, allowNull: false },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('sessions', ['userId']);
	await qi.createTable('sign_in_limits', {
		key: { type: DataTypes.STRING(255), primaryKey: true, allowNull: false },
		points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		expire: { type: DataTypes.BIGINT, allowNull: true }
	});
}

export async function down(qi: QueryInterface) {
	await qi.dropTable('sign_in_limits');
	await qi.dropTable('sessions');
}
