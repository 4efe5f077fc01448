import { DataTypes } from 'sequelize';
import type { Model, ModelStatic, Sequelize } from 'sequelize';

/** A row of `users`. */
export interface UserRow {
  id: string;
  email: string;
  name: string;
  emailVerified: Date | null;
  image: string | null;
  passwordHash: string | null;
  isSiteAdmin: boolean;
  disabledAt: Date | null;
  sessionVersion: number;
  createdAt: Date;
  updatedAt: Date;
}

/** The columns of `users` that Auth.js's adapter reads and writes; nothing secret. */
export interface AuthUserRow {
  id: string;
  email: string;
  name: string;
  emailVerified: Date | null;
  image: string | null;
}

/** A row of `verification_tokens` (sign-in links), as @auth/sequelize-adapter expects it. */
export interface VerificationTokenRow {
  token: string;
  identifier: string;
  expires: Date;
}

export type UserModel = ModelStatic<Model<UserRow, Partial<UserRow>>>;
export type AuthUserModel = ModelStatic<Model<AuthUserRow, Partial<AuthUserRow>>>;
export type VerificationTokenModel = ModelStatic<Model<VerificationTokenRow, VerificationTokenRow>>;

const id = { type: DataTypes.STRING(64), primaryKey: true };

export function defineUsers(sequelize: Sequelize): { User: UserModel; AuthUser: AuthUserModel; VerificationToken: VerificationTokenModel } {
  const User: UserModel = sequelize.define(
    'User',
    {
      id,
      email: { type: DataTypes.STRING(254), allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      emailVerified: { type: DataTypes.DATE, allowNull: true },
      image: { type: DataTypes.STRING(500), allowNull: true },
      passwordHash: { type: DataTypes.STRING(300), allowNull: true },
      isSiteAdmin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      disabledAt: { type: DataTypes.DATE, allowNull: true },
      sessionVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'users', underscored: true },
  );
  // The adapter sees only these columns, so a password hash never travels through Auth.js.
  const AuthUser: AuthUserModel = sequelize.define(
    'AuthUser',
    {
      id,
      email: { type: DataTypes.STRING(254), allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      emailVerified: { type: DataTypes.DATE, allowNull: true },
      image: { type: DataTypes.STRING(500), allowNull: true },
    },
    { tableName: 'users', underscored: true, timestamps: false },
  );
  const VerificationToken: VerificationTokenModel = sequelize.define(
    'VerificationToken',
    {
      token: { type: DataTypes.STRING(128), primaryKey: true },
      identifier: { type: DataTypes.STRING(254), allowNull: false },
      expires: { type: DataTypes.DATE, allowNull: false },
    },
    { tableName: 'verification_tokens', underscored: true, timestamps: false },
  );
  return { User, AuthUser, VerificationToken };
}
