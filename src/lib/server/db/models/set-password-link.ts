import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** A one-time link that lets an invited member choose a password. Stored hashed, expires. */
export class SetPasswordLink extends Model<
	InferAttributes<SetPasswordLink>,
	InferCreationAttributes<SetPasswordLink>
> {
	declare id: CreationOptional<string>;
	declare userId: string;
	declare tokenHash: string;
	declare expiresAt: Date;
	declare usedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		SetPasswordLink.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				userId: { type: DataTypes.UUID, allowNull: false },
				tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
				expiresAt: { type: DataTypes.DATE, allowNull: false },
				usedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'set_password_links' }
		);
	}
}
