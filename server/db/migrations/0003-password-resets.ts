/** Password-reset links: one row per e-mailed link, only the SHA-256 of its token stored, single use, with an expiry. */
import { DataTypes, type QueryInterface } from 'sequelize';

/** Create `password_resets`. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('password_resets', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('password_resets', ['user_id']);
}

/** Drop `password_resets`. */
export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('password_resets');
}
