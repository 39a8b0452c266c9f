import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { FIELD_LIMITS } from '../../../schemas/limits';

/** A personal API token. Only its SHA-256 is stored; `prefix` lets the owner tell tokens apart. */
export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
	declare id: CreationOptional<string>;
	declare userId: string;
	declare label: string;
	declare tokenHash: string;
	declare prefix: string;
	declare lastUsedAt: Date | null;
	declare revokedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		ApiToken.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				userId: { type: DataTypes.UUID, allowNull: false },
				label: { type: DataTypes.STRING(FIELD_LIMITS.tokenLabel.max), allowNull: false },
				tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
				prefix: { type: DataTypes.STRING(16), allowNull: false },
				lastUsedAt: { type: DataTypes.DATE, allowNull: true },
				revokedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'api_tokens' }
		);
	}
}
