import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { Intermediate } from './intermediate';
import type { Project } from './project';
import type { Step } from './step';
import { FIELD_LIMITS } from '../../../schemas/limits';
import { ROUTE_STATUSES, type RouteStatus } from '../../../review/contract';

export { ROUTE_STATUSES, type RouteStatus };

export class Route extends Model<InferAttributes<Route>, InferCreationAttributes<Route>> {
	declare id: CreationOptional<string>;
	declare projectId: string;
	declare name: string;
	declare status: CreationOptional<RouteStatus>;
	/** Optimistic concurrency: every saved change increments it; a stale save gets 409. */
	declare version: CreationOptional<number>;
	declare createdById: string | null;
	declare archivedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare project?: NonAttribute<Project>;
	declare intermediates?: NonAttribute<Intermediate[]>;
	declare steps?: NonAttribute<Step[]>;

	static initModel(sequelize: Sequelize) {
		Route.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				projectId: { type: DataTypes.UUID, allowNull: false },
				name: { type: DataTypes.STRING(FIELD_LIMITS.routeName.max), allowNull: false },
				status: {
					type: DataTypes.STRING(24),
					allowNull: false,
					defaultValue: 'draft',
					validate: { isIn: [[...ROUTE_STATUSES]] }
				},
				version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
				createdById: { type: DataTypes.UUID, allowNull: true },
				archivedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'routes' }
		);
	}
}
