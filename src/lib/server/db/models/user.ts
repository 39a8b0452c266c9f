import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { FIELD_LIMITS } from '../../../schemas/limits';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
	declare id: CreationOptional<string>;
	declare email: string;
	declare name: string;
	/** Null until the person sets a password through their one-time link. */
	declare passwordHash: string | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		User.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
				name: { type: DataTypes.STRING(FIELD_LIMITS.personName.max), allowNull: false },
				passwordHash: { type: DataTypes.STRING(100), allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'users' }
		);
	}
}
