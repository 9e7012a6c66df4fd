/** Design models: project, assembly, variant and its saved versions. */
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { VariantStatus } from '@shared/schemas/variants';
import { UserModel } from './accounts';

/** A project in a workspace. */
export class ProjectModel extends Model<InferAttributes<ProjectModel>, InferCreationAttributes<ProjectModel>> {
  declare id: CreationOptional<number>;
  declare workspaceId: number;
  declare name: string;
  declare description: string;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** An assembly (one package) in a project. */
export class AssemblyModel extends Model<InferAttributes<AssemblyModel>, InferCreationAttributes<AssemblyModel>> {
  declare id: CreationOptional<number>;
  declare projectId: number;
  declare name: string;
  declare description: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A placement variant: the model document (JSON text), review status and optimistic version. */
export class VariantModel extends Model<InferAttributes<VariantModel>, InferCreationAttributes<VariantModel>> {
  declare id: CreationOptional<number>;
  declare assemblyId: number;
  declare name: string;
  declare note: string;
  declare status: VariantStatus;
  declare model: string;
  declare version: number;
  declare updatedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare updatedBy?: UserModel | null;
}

/** One saved state of a variant's model. */
export class VariantVersionModel extends Model<InferAttributes<VariantVersionModel>, InferCreationAttributes<VariantVersionModel>> {
  declare id: CreationOptional<number>;
  declare variantId: number;
  declare version: number;
  declare model: string;
  declare summary: string;
  declare savedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare savedBy?: UserModel | null;
}

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

/** Register the design models on `sequelize`. */
export function initDesignModels(sequelize: Sequelize): void {
  ProjectModel.init(
    { id, workspaceId: DataTypes.INTEGER, name: DataTypes.TEXT, description: DataTypes.TEXT, createdById: DataTypes.INTEGER, ...stamps },
    { sequelize, tableName: 'projects' },
  );
  AssemblyModel.init(
    { id, projectId: DataTypes.INTEGER, name: DataTypes.TEXT, description: DataTypes.TEXT, ...stamps },
    { sequelize, tableName: 'assemblies' },
  );
  VariantModel.init(
    {
      id, assemblyId: DataTypes.INTEGER, name: DataTypes.TEXT, note: DataTypes.TEXT, status: DataTypes.TEXT,
      model: DataTypes.TEXT, version: DataTypes.INTEGER, updatedById: DataTypes.INTEGER, ...stamps,
    },
    { sequelize, tableName: 'variants' },
  );
  VariantVersionModel.init(
    { id, variantId: DataTypes.INTEGER, version: DataTypes.INTEGER, model: DataTypes.TEXT, summary: DataTypes.TEXT, savedById: DataTypes.INTEGER, ...stamps },
    { sequelize, tableName: 'variant_versions' },
  );
  AssemblyModel.belongsTo(ProjectModel, { foreignKey: 'projectId', as: 'project' });
  VariantModel.belongsTo(AssemblyModel, { foreignKey: 'assemblyId', as: 'assembly' });
  VariantModel.belongsTo(UserModel, { foreignKey: 'updatedById', as: 'updatedBy' });
  VariantVersionModel.belongsTo(UserModel, { foreignKey: 'savedById', as: 'savedBy' });
}
