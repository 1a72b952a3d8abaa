import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';
import type { PieceSpec } from '../../../shared/engine/types.ts';

/** One immutable saved state of a design (a database trigger refuses updates). */
export interface RevisionRow extends Model<InferAttributes<RevisionRow>, InferCreationAttributes<RevisionRow>> {
  id: CreationOptional<string>;
  designId: string;
  number: number;
  spec: PieceSpec;
  engineVersion: string;
  summary: Record<string, unknown>;
  authorId: string | null;
  message: string;
  restoredFrom: number | null;
  createdAt: CreationOptional<Date>;
}

export function defineRevision(sequelize: Sequelize) {
  return sequelize.define<RevisionRow>(
    'Revision',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      designId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      spec: { type: DataTypes.JSONB, allowNull: false },
      engineVersion: { type: DataTypes.TEXT, allowNull: false },
      summary: { type: DataTypes.JSONB, allowNull: false },
      authorId: { type: DataTypes.UUID, allowNull: true },
      message: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      restoredFrom: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'revisions', underscored: true, updatedAt: false },
  );
}
