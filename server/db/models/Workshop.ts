import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';

/** A shop: its members, designs and (later) its price list hang off it. */
export interface WorkshopRow extends Model<InferAttributes<WorkshopRow>, InferCreationAttributes<WorkshopRow>> {
  id: CreationOptional<string>;
  name: string;
  settings: CreationOptional<Record<string, unknown>>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function defineWorkshop(sequelize: Sequelize) {
  return sequelize.define<WorkshopRow>(
    'Workshop',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.TEXT, allowNull: false },
      settings: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'workshops', underscored: true },
  );
}
