import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';

/** A reviewer's decision on one revision; the latest decision per revision counts. */
export interface ApprovalRow extends Model<InferAttributes<ApprovalRow>, InferCreationAttributes<ApprovalRow>> {
  id: CreationOptional<string>;
  designId: string;
  revisionNumber: number;
  reviewerId: string | null;
  decision: 'approved' | 'changes_requested';
  note: string;
  createdAt: CreationOptional<Date>;
}

export function defineApproval(sequelize: Sequelize) {
  return sequelize.define<ApprovalRow>(
    'Approval',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      designId: { type: DataTypes.UUID, allowNull: false },
      revisionNumber: { type: DataTypes.INTEGER, allowNull: false },
      reviewerId: { type: DataTypes.UUID, allowNull: true },
      decision: { type: DataTypes.TEXT, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'approvals', underscored: true, updatedAt: false },
  );
}
