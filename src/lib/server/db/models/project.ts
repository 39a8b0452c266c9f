import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { Team } from './team';
import { FIELD_LIMITS } from '../../../schemas/limits';

export class Project extends Model<InferAttributes<Project>, InferCreationAttributes<Project>> {
	declare id: CreationOptional<string>;
	declare teamId: string;
	declare name: string;
	/** What the team is making and why: free text about the target. */
	declare description: string;
	declare createdById: string | null;
	declare archivedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare team?: NonAttribute<Team>;

	static initModel(sequelize: Sequelize) {
		Project.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				teamId: { type: DataTypes.UUID, allowNull: false },
				name: { type: DataTypes.STRING(FIELD_LIMITS.projectName.max), allowNull: false },
				description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
				createdById: { type: DataTypes.UUID, allowNull: true },
				archivedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'projects' }
		);
	}
}
