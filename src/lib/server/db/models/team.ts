import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { FIELD_LIMITS } from '../../../schemas/limits';

export class Team extends Model<InferAttributes<Team>, InferCreationAttributes<Team>> {
	declare id: CreationOptional<string>;
	declare name: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Team.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				name: { type: DataTypes.STRING(FIELD_LIMITS.teamName.max), allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'teams' }
		);
	}
}
