import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { SavedConditionKind } from '../../../library/contract';
import type { User } from './user';

/**
 * A team's saved way of putting a protecting group on or taking it off (issue 16). Approval and
 * retirement are dates, so who approved and when stay on record; `uses` is never stored: it is
 * counted from the steps that name the entry (`steps.savedConditionId`).
 */
export class SavedCondition extends Model<
	InferAttributes<SavedCondition>,
	InferCreationAttributes<SavedCondition>
> {
	declare id: CreationOptional<string>;
	declare teamId: string;
	/** A protecting group id of the rule table. */
	declare protectingGroup: string;
	declare kind: SavedConditionKind;
	/** As the chemist wrote them; the reagent classifier reads them for classes and hazards. */
	declare reagents: string;
	declare solvent: string | null;
	declare temperature: string | null;
	declare time: string | null;
	declare scale: string | null;
	/** Percent, 0–100. */
	declare yield: number | null;
	/** A DOI or free text (a notebook page). */
	declare reference: string | null;
	declare notes: string | null;
	declare authorId: string | null;
	declare approvedById: string | null;
	declare approvedAt: Date | null;
	/** Kept, no longer suggested. */
	declare retiredAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare author?: NonAttribute<User | null>;

	static initModel(sequelize: Sequelize) {
		SavedCondition.init(
			{
				id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
				teamId: { type: DataTypes.UUID, allowNull: false },
				protectingGroup: { type: DataTypes.STRING(64), allowNull: false },
				kind: { type: DataTypes.STRING(16), allowNull: false },
				reagents: { type: DataTypes.TEXT, allowNull: false },
				solvent: { type: DataTypes.STRING(200), allowNull: true },
				temperature: { type: DataTypes.STRING(100), allowNull: true },
				time: { type: DataTypes.STRING(100), allowNull: true },
				scale: { type: DataTypes.STRING(100), allowNull: true },
				yield: { type: DataTypes.FLOAT, allowNull: true },
				reference: { type: DataTypes.STRING(500), allowNull: true },
				notes: { type: DataTypes.TEXT, allowNull: true },
				authorId: { type: DataTypes.UUID, allowNull: true },
				approvedById: { type: DataTypes.UUID, allowNull: true },
				approvedAt: { type: DataTypes.DATE, allowNull: true },
				retiredAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'saved_conditions' }
		);
	}
}
