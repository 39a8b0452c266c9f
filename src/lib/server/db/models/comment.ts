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

/** A Markdown comment on a route, or on one of its steps; may reply to another comment. */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
	declare id: CreationOptional<string>;
	declare routeId: string;
	/** The step's id in the route document; null for the route's own thread. */
	declare stepKey: string | null;
	declare replyToId: string | null;
	/** Null once the author's account is gone; the comment stays. */
	declare authorId: string | null;
	/** The Markdown as written; the HTML is rendered and sanitised on every read. */
	declare body: string;
	declare resolved: CreationOptional<boolean>;
	declare resolvedById: string | null;
	/** Set when the author changes the body (shown as "edited"). */
	declare editedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare author?: NonAttribute<User | null>;

	static initModel(sequelize: Sequelize) {
		Comment.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				routeId: { type: DataTypes.UUID, allowNull: false },
				stepKey: { type: DataTypes.STRING(64), allowNull: true },
				replyToId: { type: DataTypes.UUID, allowNull: true },
				authorId: { type: DataTypes.UUID, allowNull: true },
				body: { type: DataTypes.TEXT, allowNull: false },
				resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
				resolvedById: { type: DataTypes.UUID, allowNull: true },
				editedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'comments' }
		);
	}
}
