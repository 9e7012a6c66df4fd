/** First schema: accounts, workspaces, designs, library, review trail, results, outbox. */
import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const fk = (table: string, onDelete: 'CASCADE' | 'SET NULL', allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});
const text = (allowNull = false) => ({ type: DataTypes.TEXT, allowNull });

/** Create every table of the first schema. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('users', {
    id, email: { type: DataTypes.STRING(254), allowNull: false, unique: true }, name: text(), password_hash: text(), ...stamps,
  });
  await qi.createTable('workspaces', { id, name: text(), ...stamps });
  await qi.createTable('memberships', {
    id, user_id: fk('users', 'CASCADE'), workspace_id: fk('workspaces', 'CASCADE'), role: text(), ...stamps,
  });
  await qi.addIndex('memberships', ['user_id', 'workspace_id'], { unique: true });
  await qi.createTable('invitations', {
    id, workspace_id: fk('workspaces', 'CASCADE'), email: text(), role: text(),
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false }, used_at: { type: DataTypes.DATE, allowNull: true },
    invited_by_id: fk('users', 'SET NULL', true), ...stamps,
  });
  await qi.createTable('projects', {
    id, workspace_id: fk('workspaces', 'CASCADE'), name: text(), description: text(), created_by_id: fk('users', 'SET NULL', true), ...stamps,
  });
  await qi.createTable('assemblies', { id, project_id: fk('projects', 'CASCADE'), name: text(), description: text(), ...stamps });
  await qi.createTable('variants', {
    id, assembly_id: fk('assemblies', 'CASCADE'), name: text(), note: text(), status: text(), model: text(),
    version: { type: DataTypes.INTEGER, allowNull: false }, updated_by_id: fk('users', 'SET NULL', true), ...stamps,
  });
  await qi.createTable('variant_versions', {
    id, variant_id: fk('variants', 'CASCADE'), version: { type: DataTypes.INTEGER, allowNull: false }, model: text(),
    summary: text(), saved_by_id: fk('users', 'SET NULL', true), ...stamps,
  });
  await qi.addIndex('variant_versions', ['variant_id', 'version'], { unique: true });
  await qi.createTable('materials', {
    id, workspace_id: fk('workspaces', 'CASCADE'), name: text(),
    kxy: { type: DataTypes.DOUBLE, allowNull: false }, kz: { type: DataTypes.DOUBLE, allowNull: false },
    rho: { type: DataTypes.DOUBLE, allowNull: false }, cp: { type: DataTypes.DOUBLE, allowNull: false },
    source: text(), kind: text(), ...stamps,
  });
  await qi.createTable('part_templates', { id, workspace_id: fk('workspaces', 'CASCADE'), name: text(), note: text(), part: text(), ...stamps });
  await qi.createTable('comments', {
    id, variant_id: fk('variants', 'CASCADE'), author_id: fk('users', 'SET NULL', true), text: text(), part_id: text(true), ...stamps,
  });
  await qi.createTable('activity_events', {
    id, project_id: fk('projects', 'CASCADE'), variant_id: fk('variants', 'SET NULL', true), actor_id: fk('users', 'SET NULL', true),
    kind: text(), summary: text(), ...stamps,
  });
  await qi.addIndex('activity_events', ['project_id', 'id']);
  await qi.createTable('stored_results', {
    id, variant_id: fk('variants', 'CASCADE'), kind: text(), input_hash: { type: DataTypes.STRING(64), allowNull: false },
    result: text(), ...stamps,
  });
  await qi.addIndex('stored_results', ['variant_id', 'kind', 'input_hash'], { unique: true });
  await qi.createTable('outbox_messages', {
    id, workspace_id: { type: DataTypes.INTEGER, allowNull: true }, to: text(), from: text(), subject: text(), text: text(),
    html: text(true), date: { type: DataTypes.DATE, allowNull: false }, ...stamps,
  });
}

/** Drop every table of the first schema. */
export async function down(qi: QueryInterface): Promise<void> {
  for (const t of ['outbox_messages', 'stored_results', 'activity_events', 'comments', 'part_templates', 'materials',
    'variant_versions', 'variants', 'assemblies', 'projects', 'invitations', 'memberships', 'workspaces', 'users']) {
    await qi.dropTable(t);
  }
}
