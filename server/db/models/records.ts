/** Library, review-trail, result and outbox models. */
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { UserModel } from './accounts';

/** A material of a workspace library (SI units). */
export class MaterialModel extends Model<InferAttributes<MaterialModel>, InferCreationAttributes<MaterialModel>> {
  declare id: CreationOptional<number>;
  declare workspaceId: number;
  declare name: string;
  declare kxy: number;
  declare kz: number;
  declare rho: number;
  declare cp: number;
  declare source: string;
  declare kind: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A reusable part (JSON text of the part without placement). */
export class PartTemplateModel extends Model<InferAttributes<PartTemplateModel>, InferCreationAttributes<PartTemplateModel>> {
  declare id: CreationOptional<number>;
  declare workspaceId: number;
  declare name: string;
  declare note: string;
  declare part: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A comment on a variant, optionally pinned to a part. */
export class CommentModel extends Model<InferAttributes<CommentModel>, InferCreationAttributes<CommentModel>> {
  declare id: CreationOptional<number>;
  declare variantId: number;
  declare authorId: number | null;
  declare text: string;
  declare partId: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare author?: UserModel | null;
}

/** One entry of a project's activity trail. */
export class ActivityEventModel extends Model<InferAttributes<ActivityEventModel>, InferCreationAttributes<ActivityEventModel>> {
  declare id: CreationOptional<number>;
  declare projectId: number;
  declare variantId: number | null;
  declare actorId: number | null;
  declare kind: string;
  declare summary: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare actor?: UserModel | null;
}

/** A solver result cached by a hash of its inputs. */
export class StoredResultModel extends Model<InferAttributes<StoredResultModel>, InferCreationAttributes<StoredResultModel>> {
  declare id: CreationOptional<number>;
  declare variantId: number;
  declare kind: string;
  declare inputHash: string;
  declare result: string;
  /** Plane maps of an assembly result as JSON text, kept apart so most answers never read them (null for other kinds). */
  declare maps: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A message received by the local fake SMTP server. */
export class OutboxMessageModel extends Model<InferAttributes<OutboxMessageModel>, InferCreationAttributes<OutboxMessageModel>> {
  declare id: CreationOptional<number>;
  declare workspaceId: number | null;
  declare to: string;
  declare from: string;
  declare subject: string;
  declare text: string;
  declare html: string | null;
  declare date: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };
const num = DataTypes.DOUBLE;

/** Register the library, trail, result and outbox models on `sequelize`. */
export function initRecordModels(sequelize: Sequelize): void {
  MaterialModel.init(
    { id, workspaceId: DataTypes.INTEGER, name: DataTypes.TEXT, kxy: num, kz: num, rho: num, cp: num, source: DataTypes.TEXT, kind: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'materials' },
  );
  PartTemplateModel.init(
    { id, workspaceId: DataTypes.INTEGER, name: DataTypes.TEXT, note: DataTypes.TEXT, part: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'part_templates' },
  );
  CommentModel.init(
    { id, variantId: DataTypes.INTEGER, authorId: DataTypes.INTEGER, text: DataTypes.TEXT, partId: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'comments' },
  );
  ActivityEventModel.init(
    { id, projectId: DataTypes.INTEGER, variantId: DataTypes.INTEGER, actorId: DataTypes.INTEGER, kind: DataTypes.TEXT, summary: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'activity_events' },
  );
  StoredResultModel.init(
    { id, variantId: DataTypes.INTEGER, kind: DataTypes.TEXT, inputHash: DataTypes.STRING, result: DataTypes.TEXT, maps: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'stored_results' },
  );
  OutboxMessageModel.init(
    {
      id, workspaceId: DataTypes.INTEGER, to: DataTypes.TEXT, from: DataTypes.TEXT, subject: DataTypes.TEXT, text: DataTypes.TEXT,
      html: DataTypes.TEXT, date: DataTypes.DATE, ...stamps,
    },
    { sequelize, tableName: 'outbox_messages' },
  );
  CommentModel.belongsTo(UserModel, { foreignKey: 'authorId', as: 'author' });
  ActivityEventModel.belongsTo(UserModel, { foreignKey: 'actorId', as: 'actor' });
}
