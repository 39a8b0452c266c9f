import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { User } from './user';
import { REVIEW_EVENT_ACTIONS, type ReviewEventAction } from '../../../review/contract';

/**
 * One line of a route's review history: a request (with the reviewers asked), an approval or a
 * request for changes (with the note), a withdrawal, or the return to draft after an edit.
 * `version` is the route version the action was taken on; the latest `approve` gives the
 * route's approved version.
 */
export class ReviewEvent extends Model<
	InferAttributes<ReviewEvent>,
	InferCreationAttributes<ReviewEvent>
> {
	declare id: CreationOptional<string>;
	declare routeId: string;
	declare actorId: string | null;
	declare action: ReviewEventAction;
	/** User ids asked to review (`request` only). */
	declare reviewerIds: string[] | null;
	declare note: string | null;
	declare version: number;
	declare createdAt: CreationOptional<Date>;
	declare actor?: NonAttribute<User | null>;

	static initModel(sequelize: Sequelize) {
		ReviewEvent.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				routeId: { type: DataTypes.UUID, allowNull: false },
				actorId: { type: DataTypes.UUID, allowNull: true },
				action: {
					type: DataTypes.STRING(24),
					allowNull: false,
					validate: { isIn: [[...REVIEW_EVENT_ACTIONS]] }
				},
				reviewerIds: { type: DataTypes.JSON, allowNull: true },
				note: { type: DataTypes.TEXT, allowNull: true },
				version: { type: DataTypes.INTEGER, allowNull: false },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'review_events', updatedAt: false }
		);
	}
}
