import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { User } from './user';

/**
 * One rating of the rule table as a team sees it (issue 16): a protecting group's stability or a
 * free group's reactivity under a condition class, or under one reagent of that class. Read into
 * the rule table's override layer for the team's checks and plans.
 */
export class TeamRuleOverride extends Model<
	InferAttributes<TeamRuleOverride>,
	InferCreationAttributes<TeamRuleOverride>
> {
	declare id: CreationOptional<string>;
	declare teamId: string;
	/** A protecting group id or a free group id. */
	declare subject: string;
	/** A condition class id. */
	declare condition: string;
	/** A reagent's name in rules/reagents.json; null for the whole class. */
	declare reagent: string | null;
	/** stable | caution | labile for a protecting group; reacts | caution | none for a free group. */
	declare rating: string;
	declare reason: string;
	declare source: string;
	declare authorId: string | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare author?: NonAttribute<User | null>;

	static initModel(sequelize: Sequelize) {
		TeamRuleOverride.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				teamId: { type: DataTypes.UUID, allowNull: false },
				subject: { type: DataTypes.STRING(64), allowNull: false },
				condition: { type: DataTypes.STRING(64), allowNull: false },
				reagent: { type: DataTypes.STRING(200), allowNull: true },
				rating: { type: DataTypes.STRING(16), allowNull: false },
				reason: { type: DataTypes.TEXT, allowNull: false },
				source: { type: DataTypes.STRING(500), allowNull: false },
				authorId: { type: DataTypes.UUID, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'team_rule_overrides' }
		);
	}
}
