import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type ModelAttributes,
  type ModelStatic,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';

/**
 * A plant's one settings document (price book, lumber stock, production settings): its plant,
 * its JSON data (validated by the document's shared schema before it is saved) and who saved it last.
 */
export abstract class PlantDocument<D> extends Model<
  InferAttributes<PlantDocument<D>>,
  InferCreationAttributes<PlantDocument<D>>
> {
  declare id: CreationOptional<number>;
  declare plantId: number;
  declare data: D;
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare editor?: NonAttribute<User | null>;
}

const COLUMNS: ModelAttributes = {
  id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
  plantId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
  data: { type: DataTypes.JSONB, allowNull: false },
  updatedBy: { type: DataTypes.INTEGER, allowNull: true },
  createdAt: DataTypes.DATE,
  updatedAt: DataTypes.DATE,
};

/** Map a plant document model onto its table (one row per plant). */
export function initPlantDocument<D>(
  model: ModelStatic<PlantDocument<D>>,
  sequelize: Sequelize,
  tableName: string,
) {
  // The columns do not depend on D; TypeScript cannot see that through InferAttributes.
  model.init(COLUMNS as ModelAttributes<PlantDocument<D>>, {
    sequelize,
    tableName,
    underscored: true,
  });
}
