import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
/** A person's mail choices; no row means the defaults (comment mails on). */
export class MailPreference extends Model<
	InferAttributes<MailPreference>,
	InferCreationAttributes<MailPreference>
> {
	declare userId: string;
	declare commentMails: CreationOptional<boolean>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		MailPreference.init(
			{
				userId: { type: DataTypes.UUID, primaryKey: true },
				commentMails: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'mail_preferences' }
		);
	}
}
