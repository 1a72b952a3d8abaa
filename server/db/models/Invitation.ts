import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';
import type { Role } from '../../../shared/permissions.ts';

/** An e-mailed invitation to join a workshop; only the token's SHA-256 is stored. */
export interface InvitationRow extends Model<InferAttributes<InvitationRow>, InferCreationAttributes<InvitationRow>> {
  id: CreationOptional<string>;
  workshopId: string;
  email: string;
  role: Role;
  tokenHash: string;
  invitedBy: string | null;
  expiresAt: Date;
  acceptedAt: CreationOptional<Date | null>;
  acceptedBy: CreationOptional<string | null>;
  createdAt: CreationOptional<Date>;
}

export function defineInvitation(sequelize: Sequelize) {
  return sequelize.define<InvitationRow>(
    'Invitation',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      workshopId: { type: DataTypes.UUID, allowNull: false },
      email: { type: DataTypes.TEXT, allowNull: false },
      role: { type: DataTypes.TEXT, allowNull: false },
      tokenHash: { type: DataTypes.TEXT, allowNull: false },
      invitedBy: { type: DataTypes.UUID, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      acceptedBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'invitations', underscored: true, updatedAt: false },
  );
}
