/** Migration 0002: plane maps of stored assembly results move to their own column and back, unchanged. */
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { solveAssembly } from '@shared/engine/assembly/solve';
import { lx9Model } from '@shared/demo/lx9';
import * as m0002 from '../../../server/db/migrations/0002-result-maps';
import { makeTestApp, type TestApp } from '../helpers/testApp';

let t: TestApp;
beforeAll(async () => {
  t = await makeTestApp();
});
afterAll(async () => t.dispose());

describe('migration 0002-result-maps', () => {
  it('splits a stored result written before the change into result and maps, and merges it back on down', async () => {
    const qi = t.sequelize.getQueryInterface();
    const q = <T extends object>(sql: string, replacements: unknown[] = []) => t.sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });
    const [{ id: variantId }] = await q<{ id: number }>('SELECT id FROM variants ORDER BY id LIMIT 1');
    const full = solveAssembly(lx9Model('A'), 'idle', { mapSize: 16 });

    await m0002.down(qi);
    const now = new Date().toISOString();
    await t.sequelize.query(
      "INSERT INTO stored_results (variant_id, kind, input_hash, result, created_at, updated_at) VALUES (?, 'assembly-steady', ?, ?, ?, ?), (?, 'transient-timeline', ?, ?, ?, ?)",
      { replacements: [variantId, 'a'.repeat(64), JSON.stringify(full), now, now, variantId, 'b'.repeat(64), '{"rows":[1,2]}', now, now] },
    );

    await m0002.up(qi);
    const [assembly] = await q<{ result: string; maps: string | null }>("SELECT result, maps FROM stored_results WHERE input_hash = ?", ['a'.repeat(64)]);
    const { maps, ...summary } = full;
    expect(JSON.parse(assembly.result)).toEqual(summary);
    expect(JSON.parse(assembly.maps!)).toEqual(maps);
    const [other] = await q<{ result: string; maps: string | null }>("SELECT result, maps FROM stored_results WHERE input_hash = ?", ['b'.repeat(64)]);
    expect(other).toEqual({ result: '{"rows":[1,2]}', maps: null });

    await m0002.down(qi);
    const [merged] = await q<{ result: string }>("SELECT result FROM stored_results WHERE input_hash = ?", ['a'.repeat(64)]);
    expect(JSON.parse(merged.result)).toEqual(full);
    await m0002.up(qi);
    const schema = await q<{ sql: string | null }>("SELECT sql FROM sqlite_master WHERE tbl_name = 'stored_results'");
    expect(schema.map((r) => r.sql).join('\n')).toMatch(/ON DELETE CASCADE[\s\S]*CREATE UNIQUE INDEX `stored_results_variant_id_kind_input_hash`/);
  });
});
