import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';
import type { PieceKind } from '../../../shared/engine/types.ts';

/**
 * A design: a title and a kind in a workshop, pointing at its head revision by number. The
 * revisions themselves never change; saving adds one and moves `headRevision`.
 */
export interface DesignRow extends Model<InferAttributes<DesignRow>, InferCreationAttributes<DesignRow>> {
  id: CreationOptional<string>;
  workshopId: string;
  title: string;
  kind: PieceKind;
  headRevision: CreationOptional<number>;
  approvedRevision: CreationOptional<number | null>;
  originDesignId: CreationOptional<string | null>;
  originRevision: CreationOptional<number | null>;
  archivedAt: CreationOptional<Date | null>;
  createdBy: string | null;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function defineDesign(sequelize: Sequelize) {
  return sequelize.define<DesignRow>(
    'Design',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      workshopId: { type: DataTypes.UUID, allowNull: false },
      title: { type: DataTypes.TEXT, allowNull: false },
      kind: { type: DataTypes.TEXT, allowNull: false },
      headRevision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      approvedRevision: { type: DataTypes.INTEGER, allowNull: true },
      originDesignId: { type: DataTypes.UUID, allowNull: true },
      originRevision: { type: DataTypes.INTEGER, allowNull: true },
      archivedAt: { type: DataTypes.DATE, allowNull: true },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'designs', underscored: true },
  );
}
