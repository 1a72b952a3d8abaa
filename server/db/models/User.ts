import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type Sequelize } from 'sequelize';

/** A person who signs in. The e-mail is stored lower-cased; the password only as an argon2 hash. */
export interface UserRow extends Model<InferAttributes<UserRow>, InferCreationAttributes<UserRow>> {
  id: CreationOptional<string>;
  email: string;
  name: string;
  passwordHash: string;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function defineUser(sequelize: Sequelize) {
  return sequelize.define<UserRow>(
    'User',
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      email: { type: DataTypes.TEXT, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      passwordHash: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'users', underscored: true },
  );
}
