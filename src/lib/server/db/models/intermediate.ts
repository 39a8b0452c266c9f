import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { FIELD_LIMITS } from '../../../schemas/limits';

export class Intermediate extends Model<
	InferAttributes<Intermediate>,
	InferCreationAttributes<Intermediate>
> {
	declare id: CreationOptional<string>;
	declare routeId: string;
	/** The client's id for this intermediate inside the route document. */
	declare key: string;
	declare label: string | null;
	/** As the chemist entered it: SMILES, molfile or one SDF record. */
	declare structure: string;
	/** The openchemlib ID code, when the structure could be read; perception is cached by it. */
	declare canonical: string | null;
	declare positionX: number | null;
	declare positionY: number | null;
	declare ordinal: number;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Intermediate.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				routeId: { type: DataTypes.UUID, allowNull: false },
				key: { type: DataTypes.STRING(64), allowNull: false },
				label: { type: DataTypes.STRING(FIELD_LIMITS.intermediateLabel.max), allowNull: true },
				structure: { type: DataTypes.TEXT, allowNull: false },
				canonical: { type: DataTypes.TEXT, allowNull: true },
				positionX: { type: DataTypes.DOUBLE, allowNull: true },
				positionY: { type: DataTypes.DOUBLE, allowNull: true },
				ordinal: { type: DataTypes.INTEGER, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'intermediates' }
		);
	}
}
