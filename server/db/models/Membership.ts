import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';
import type { Role } from '../../../shared/permissions.ts';

/** A user's one role in one workshop. */
export interface MembershipRow extends Model<InferAttributes<MembershipRow>, InferCreationAttributes<MembershipRow>> {
  workshopId: string;
  userId: string;
  role: Role;
  createdAt: CreationOptional<Date>;
}

export function defineMembership(sequelize: Sequelize) {
  return sequelize.define<MembershipRow>(
    'Membership',
    {
      workshopId: { type: DataTypes.UUID, primaryKey: true },
      userId: { type: DataTypes.UUID, primaryKey: true },
      role: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'memberships', underscored: true, updatedAt: false },
  );
}
