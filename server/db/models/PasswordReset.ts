import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';

/** A one-time, expiring password-reset token; only its SHA-256 is stored. */
export interface PasswordResetRow extends Model<InferAttributes<PasswordResetRow>, InferCreationAttributes<PasswordResetRow>> {
  id: CreationOptional<string>;
  userId: string;
  tokenHash: string;
  expiresAt: Date;
  usedAt: CreationOptional<Date | null>;
  createdAt: CreationOptional<Date>;
}

export function definePasswordReset(sequelize: Sequelize) {
  return sequelize.define<PasswordResetRow>(
    'PasswordReset',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      tokenHash: { type: DataTypes.TEXT, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'password_resets', underscored: true, updatedAt: false },
  );
}
