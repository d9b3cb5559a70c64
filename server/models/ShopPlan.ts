import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { CutListView } from '../../shared/api/shop';
import type { LumberPlanBody } from '../../shared/api/lumberPlan';
import type { ShopPlanProgress, ShopPlanRunState } from '../../shared/api/shopPlan';

/**
 * An order's stored shop plan: the cut list and lumber plan the job made, the engine version and
 * the hashes of what it was made from (approved designs, stock settings); and the state of the
 * run (queued, running with its progress, failed) that makes the next one.
 */
export class ShopPlan extends Model<InferAttributes<ShopPlan>, InferCreationAttributes<ShopPlan>> {
  declare id: CreationOptional<number>;
  declare orderId: number;
  declare plantId: number;
  declare cutList: CreationOptional<CutListView | null>;
  declare lumberPlan: CreationOptional<LumberPlanBody | null>;
  declare engineVersion: CreationOptional<string | null>;
  declare designsHash: CreationOptional<string | null>;
  declare stockHash: CreationOptional<string | null>;
  declare madeAt: CreationOptional<Date | null>;
  declare runState: CreationOptional<ShopPlanRunState>;
  declare runProgress: CreationOptional<ShopPlanProgress | null>;
  declare runError: CreationOptional<string | null>;
  declare requestedAt: CreationOptional<Date | null>;
  declare requestedBy: CreationOptional<number | null>;
  declare jobId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShopPlan.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        orderId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        plantId: { type: DataTypes.INTEGER, allowNull: false },
        cutList: { type: DataTypes.JSONB, allowNull: true },
        lumberPlan: { type: DataTypes.JSONB, allowNull: true },
        engineVersion: { type: DataTypes.STRING(20), allowNull: true },
        designsHash: { type: DataTypes.STRING(64), allowNull: true },
        stockHash: { type: DataTypes.STRING(64), allowNull: true },
        madeAt: { type: DataTypes.DATE, allowNull: true },
        runState: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'idle' },
        runProgress: { type: DataTypes.JSONB, allowNull: true },
        runError: { type: DataTypes.TEXT, allowNull: true },
        requestedAt: { type: DataTypes.DATE, allowNull: true },
        requestedBy: { type: DataTypes.INTEGER, allowNull: true },
        jobId: { type: DataTypes.STRING(64), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'shop_plans', underscored: true },
    );
  }
}
