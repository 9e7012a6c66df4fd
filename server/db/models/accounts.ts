/** Account models: user, workspace, membership, invitation, password reset. */
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '@shared/schemas/roles';

/** A person who can sign in. */
export class UserModel extends Model<InferAttributes<UserModel>, InferCreationAttributes<UserModel>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A team's space: members, projects, library. */
export class WorkspaceModel extends Model<InferAttributes<WorkspaceModel>, InferCreationAttributes<WorkspaceModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A user's role in one workspace. */
export class MembershipModel extends Model<InferAttributes<MembershipModel>, InferCreationAttributes<MembershipModel>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare workspaceId: number;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** An e-mailed invitation; only the SHA-256 of its token is stored. */
export class InvitationModel extends Model<InferAttributes<InvitationModel>, InferCreationAttributes<InvitationModel>> {
  declare id: CreationOptional<number>;
  declare workspaceId: number;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare invitedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** An e-mailed password-reset link; only the SHA-256 of its token is stored. */
export class PasswordResetModel extends Model<InferAttributes<PasswordResetModel>, InferCreationAttributes<PasswordResetModel>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

/** Register the account models on `sequelize`. */
export function initAccountModels(sequelize: Sequelize): void {
  UserModel.init(
    { id, email: { type: DataTypes.STRING, allowNull: false, unique: true }, name: DataTypes.TEXT, passwordHash: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'users' },
  );
  WorkspaceModel.init({ id, name: DataTypes.TEXT, ...stamps }, { sequelize, tableName: 'workspaces' });
  MembershipModel.init(
    { id, userId: DataTypes.INTEGER, workspaceId: DataTypes.INTEGER, role: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'memberships' },
  );
  InvitationModel.init(
    {
      id, workspaceId: DataTypes.INTEGER, email: DataTypes.TEXT, role: DataTypes.TEXT, tokenHash: DataTypes.STRING,
      expiresAt: DataTypes.DATE, usedAt: DataTypes.DATE, invitedById: DataTypes.INTEGER, ...stamps,
    },
    { sequelize, tableName: 'invitations' },
  );
  PasswordResetModel.init(
    { id, userId: DataTypes.INTEGER, tokenHash: DataTypes.STRING, expiresAt: DataTypes.DATE, usedAt: DataTypes.DATE, ...stamps },
    { sequelize, tableName: 'password_resets' },
  );
  MembershipModel.belongsTo(UserModel, { foreignKey: 'userId', as: 'user' });
  MembershipModel.belongsTo(WorkspaceModel, { foreignKey: 'workspaceId', as: 'workspace' });
  InvitationModel.belongsTo(UserModel, { foreignKey: 'invitedById', as: 'invitedBy' });
  PasswordResetModel.belongsTo(UserModel, { foreignKey: 'userId', as: 'user' });
}
