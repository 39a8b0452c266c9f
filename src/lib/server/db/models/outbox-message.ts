import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { OUTBOX_STATUSES, type OutboxStatus } from '../../../review/contract';

/**
 * A mail waiting to go, written in the same transaction as the change that causes it; the
 * background sender (src/lib/server/mail/sender.ts) claims, sends and marks it.
 */
export class OutboxMessage extends Model<
	InferAttributes<OutboxMessage>,
	InferCreationAttributes<OutboxMessage>
> {
	declare id: CreationOptional<string>;
	declare teamId: string;
	declare to: string;
	declare subject: string;
	declare text: string;
	declare status: CreationOptional<OutboxStatus>;
	declare attempts: CreationOptional<number>;
	declare lastError: string | null;
	/** When the sender may next try; a claim moves it forward by the lease. */
	declare nextAttemptAt: Date;
	/** Which sender holds (or last held) the claim. */
	declare claimedBy: string | null;
	declare sentAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		OutboxMessage.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				teamId: { type: DataTypes.UUID, allowNull: false },
				to: { type: DataTypes.STRING(320), allowNull: false },
				subject: { type: DataTypes.STRING(300), allowNull: false },
				text: { type: DataTypes.TEXT, allowNull: false },
				status: {
					type: DataTypes.STRING(16),
					allowNull: false,
					defaultValue: 'queued',
					validate: { isIn: [[...OUTBOX_STATUSES]] }
				},
				attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
				lastError: { type: DataTypes.TEXT, allowNull: true },
				nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
				claimedBy: { type: DataTypes.STRING(64), allowNull: true },
				sentAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'outbox_messages' }
		);
	}
}
