import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';
import type { PriceItem } from '../../../shared/materials/priceList.ts';

/** A workshop's price list, stored whole: its currency and its rows (checked by `priceListSchema`). */
export interface PriceListRow extends Model<InferAttributes<PriceListRow>, InferCreationAttributes<PriceListRow>> {
  workshopId: string;
  currency: string;
  items: PriceItem[];
  updatedBy: string | null;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function definePriceList(sequelize: Sequelize) {
  return sequelize.define<PriceListRow>(
    'PriceList',
    {
      workshopId: { type: DataTypes.UUID, primaryKey: true },
      currency: { type: DataTypes.TEXT, allowNull: false },
      items: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'price_lists', underscored: true },
  );
}
