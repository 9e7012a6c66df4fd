/**
 * Plane maps of stored assembly results move to their own column: most answers leave them out, and a
 * cached answer then reads ~40 KB instead of ~640 KB. Existing rows are split, nothing is recomputed.
 */
import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

const KIND = 'assembly-steady';

/** Add `stored_results.maps` and move the `maps` member of every stored assembly result into it. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.addColumn('stored_results', 'maps', { type: DataTypes.TEXT, allowNull: true });
  const rows = await qi.sequelize.query<{ id: number; result: string }>('SELECT id, result FROM stored_results WHERE kind = ?', {
    replacements: [KIND],
    type: QueryTypes.SELECT,
  });
  for (const row of rows) {
    const { maps, ...rest } = JSON.parse(row.result) as { maps?: unknown };
    if (maps === undefined) continue;
    await qi.sequelize.query('UPDATE stored_results SET result = ?, maps = ? WHERE id = ?', {
      replacements: [JSON.stringify(rest), JSON.stringify(maps), row.id],
    });
  }
}

/** Put the maps back into each result and drop the column. */
export async function down(qi: QueryInterface): Promise<void> {
  const rows = await qi.sequelize.query<{ id: number; result: string; maps: string }>('SELECT id, result, maps FROM stored_results WHERE maps IS NOT NULL', {
    type: QueryTypes.SELECT,
  });
  for (const row of rows) {
    const merged = { ...(JSON.parse(row.result) as object), maps: JSON.parse(row.maps) as unknown };
    await qi.sequelize.query('UPDATE stored_results SET result = ? WHERE id = ?', { replacements: [JSON.stringify(merged), row.id] });
  }
  // SQLite's own DROP COLUMN (3.35+): Sequelize's removeColumn rebuilds the table and loses the composite unique index.
  await qi.sequelize.query('ALTER TABLE stored_results DROP COLUMN maps');
}
