import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';

/** A comment on a design, optionally pinned to one revision and one part. */
export interface CommentRow extends Model<InferAttributes<CommentRow>, InferCreationAttributes<CommentRow>> {
  id: CreationOptional<string>;
  designId: string;
  revisionNumber: number | null;
  partId: string | null;
  authorId: string | null;
  body: string;
  createdAt: CreationOptional<Date>;
}

export function defineComment(sequelize: Sequelize) {
  return sequelize.define<CommentRow>(
    'Comment',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      designId: { type: DataTypes.UUID, allowNull: false },
      revisionNumber: { type: DataTypes.INTEGER, allowNull: true },
      partId: { type: DataTypes.TEXT, allowNull: true },
      authorId: { type: DataTypes.UUID, allowNull: true },
      body: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'comments', underscored: true, updatedAt: false },
  );
}
