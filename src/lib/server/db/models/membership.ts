import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import { ROLES, type Role } from '../../../policy';
import type { Team } from './team';
import type { User } from './user';

export class Membership extends Model<
	InferAttributes<Membership>,
	InferCreationAttributes<Membership>
> {
	declare id: CreationOptional<string>;
	declare userId: string;
	declare teamId: string;
	declare role: Role;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare user?: NonAttribute<User>;
	declare team?: NonAttribute<Team>;

	static initModel(sequelize: Sequelize) {
		Membership.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				userId: { type: DataTypes.UUID, allowNull: false },
				teamId: { type: DataTypes.UUID, allowNull: false },
				role: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [[...ROLES]] } },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'memberships' }
		);
	}
}
