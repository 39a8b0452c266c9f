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

/** One line of a team's history: who did what, to which project (and later, route), when. */
export class ActivityEvent extends Model<
	InferAttributes<ActivityEvent>,
	InferCreationAttributes<ActivityEvent>
> {
	declare id: CreationOptional<string>;
	declare teamId: string;
	declare projectId: string | null;
	declare routeId: string | null;
	declare actorId: string | null;
	/** A dotted verb such as `project.created` or `member.role-changed`. */
	declare kind: string;
	/** The sentence shown in activity lists, written when the event happens. */
	declare summary: string;
	declare details: Record<string, unknown> | null;
	declare createdAt: CreationOptional<Date>;
	declare actor?: NonAttribute<User>;

	static initModel(sequelize: Sequelize) {
		ActivityEvent.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				teamId: { type: DataTypes.UUID, allowNull: false },
				projectId: { type: DataTypes.UUID, allowNull: true },
				routeId: { type: DataTypes.UUID, allowNull: true },
				actorId: { type: DataTypes.UUID, allowNull: true },
				kind: { type: DataTypes.STRING(48), allowNull: false },
				summary: { type: DataTypes.STRING(500), allowNull: false },
				details: { type: DataTypes.JSON, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'activity_events', updatedAt: false }
		);
	}
}
