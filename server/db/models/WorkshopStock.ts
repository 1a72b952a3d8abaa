import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';
import type { StockSettings } from '../../../shared/materials/stockSettings.ts';

/** A workshop's stock, stored whole (checked by `stockSettingsSchema`). */
export interface WorkshopStockRow extends Model<InferAttributes<WorkshopStockRow>, InferCreationAttributes<WorkshopStockRow>> {
  workshopId: string;
  stock: StockSettings;
  updatedBy: string | null;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function defineWorkshopStock(sequelize: Sequelize) {
  return sequelize.define<WorkshopStockRow>(
    'WorkshopStock',
    {
      workshopId: { type: DataTypes.UUID, primaryKey: true },
      stock: { type: DataTypes.JSONB, allowNull: false },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'workshop_stock', underscored: true, freezeTableName: true },
  );
}
