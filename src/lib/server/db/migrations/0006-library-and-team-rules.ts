import { DataTypes, type QueryInterface } from 'sequelize';

// The team's own knowledge (issue 16): saved protection conditions, and the team's overrides of
// the rule table. New tables, plus one nullable column on `steps` naming the saved condition a
// step follows. Adding a column is a plain ALTER TABLE on SQLite and PostgreSQL; `steps` has no
// children, so the rebuild SQLite needs to drop it again in `down` cascades nowhere.
export async function up(qi: QueryInterface) {
	const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
	const team = {
		type: DataTypes.UUID,
		allowNull: false,
		references: { model: 'teams', key: 'id' },
		onDelete: 'CASCADE'
	};
	const person = {
		type: DataTypes.UUID,
		allowNull: true,
		references: { model: 'users', key: 'id' },
		onDelete: 'SET NULL'
	};
	await qi.createTable('saved_conditions', {
		id,
		teamId: team,
		protectingGroup: { type: DataTypes.STRING(64), allowNull: false },
		kind: { type: DataTypes.STRING(16), allowNull: false },
		reagents: { type: DataTypes.TEXT, allowNull: false },
		solvent: { type: DataTypes.STRING(200), allowNull: true },
		temperature: { type: DataTypes.STRING(100), allowNull: true },
		time: { type: DataTypes.STRING(100), allowNull: true },
		scale: { type: DataTypes.STRING(100), allowNull: true },
		yield: { type: DataTypes.FLOAT, allowNull: true },
		reference: { type: DataTypes.STRING(500), allowNull: true },
		notes: { type: DataTypes.TEXT, allowNull: true },
		authorId: person,
		approvedById: person,
		approvedAt: { type: DataTypes.DATE, allowNull: true },
		retiredAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('saved_conditions', ['teamId', 'protectingGroup', 'kind']);

	await qi.createTable('team_rule_overrides', {
		id,
		teamId: team,
		// A protecting group id or a free group id of the rule table.
		subject: { type: DataTypes.STRING(64), allowNull: false },
		condition: { type: DataTypes.STRING(64), allowNull: false },
		// A reagent's name in rules/reagents.json, for an override of that reagent only; else null.
		reagent: { type: DataTypes.STRING(200), allowNull: true },
		rating: { type: DataTypes.STRING(16), allowNull: false },
		reason: { type: DataTypes.TEXT, allowNull: false },
		source: { type: DataTypes.STRING(500), allowNull: false },
		authorId: person,
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('team_rule_overrides', ['teamId']);

	await qi.addColumn('steps', 'savedConditionId', { type: DataTypes.UUID, allowNull: true });
	await qi.addIndex('steps', ['savedConditionId']);
}

export async function down(qi: QueryInterface) {
	await qi.removeIndex('steps', ['savedConditionId']);
	await qi.removeColumn('steps', 'savedConditionId');
	await qi.dropTable('team_rule_overrides');
	await qi.dropTable('saved_conditions');
}
