import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { Route } from './route';

/** A route saved from one of the planner's plans for another route of the same project. */
export class PlannedRoute extends Model<
	InferAttributes<PlannedRoute>,
	InferCreationAttributes<PlannedRoute>
> {
	declare id: CreationOptional<string>;
	/** The route the plan was saved as. */
	declare routeId: string;
	/** The route that was planned; null once that route is gone. */
	declare plannedFromId: string | null;
	/** Which of the ranked plans was saved (1 is the planner's first choice). */
	declare rank: number;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare route?: NonAttribute<Route>;
	declare plannedFrom?: NonAttribute<Route | null>;

	static initModel(sequelize: Sequelize) {
		PlannedRoute.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				routeId: { type: DataTypes.UUID, allowNull: false },
				plannedFromId: { type: DataTypes.UUID, allowNull: true },
				rank: { type: DataTypes.INTEGER, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'planned_routes' }
		);
	}
}
