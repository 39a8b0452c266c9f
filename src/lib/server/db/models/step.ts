import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { StepIntent } from '../../../route/document';

export class Step extends Model<InferAttributes<Step>, InferCreationAttributes<Step>> {
	declare id: CreationOptional<string>;
	declare routeId: string;
	/** The client's id for this step inside the route document. */
	declare key: string;
	declare fromKeys: string[];
	declare toKey: string;
	declare reagents: string | null;
	/** Condition class ids the chemist set explicitly (reagent text adds more at check time). */
	declare conditionIds: string[] | null;
	declare notes: string | null;
	declare quantities: Record<string, unknown> | null;
	declare intent: StepIntent | null;
	declare ordinal: number;
	/** The team's saved condition this step follows (issue 16); null when none. */
	declare savedConditionId: CreationOptional<string | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Step.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				routeId: { type: DataTypes.UUID, allowNull: false },
				key: { type: DataTypes.STRING(64), allowNull: false },
				fromKeys: { type: DataTypes.JSON, allowNull: false },
				toKey: { type: DataTypes.STRING(64), allowNull: false },
				reagents: { type: DataTypes.TEXT, allowNull: true },
				conditionIds: { type: DataTypes.JSON, allowNull: true },
				notes: { type: DataTypes.TEXT, allowNull: true },
				quantities: { type: DataTypes.JSON, allowNull: true },
				intent: { type: DataTypes.STRING(16), allowNull: true },
				ordinal: { type: DataTypes.INTEGER, allowNull: false },
				savedConditionId: { type: DataTypes.UUID, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'steps' }
		);
	}
}
