import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
/** A mail the local SMTP fake received (only when SMTP_URL is unset), read with mailparser. */
export class ReceivedMail extends Model<
	InferAttributes<ReceivedMail>,
	InferCreationAttributes<ReceivedMail>
> {
	declare id: CreationOptional<string>;
	declare messageId: string | null;
	declare from: string | null;
	/** Every recipient, comma-separated as in the header. */
	declare to: string;
	declare subject: string;
	declare text: string;
	declare receivedAt: Date;

	static initModel(sequelize: Sequelize) {
		ReceivedMail.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				messageId: { type: DataTypes.STRING(300), allowNull: true },
				from: { type: DataTypes.STRING(320), allowNull: true },
				to: { type: DataTypes.STRING(2000), allowNull: false },
				subject: { type: DataTypes.STRING(300), allowNull: false },
				text: { type: DataTypes.TEXT, allowNull: false },
				receivedAt: { type: DataTypes.DATE, allowNull: false }
			},
			{ sequelize, tableName: 'received_mails', timestamps: false }
		);
	}
}
