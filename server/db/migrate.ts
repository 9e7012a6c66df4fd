/** Runs pending migrations at start (umzug, history kept in the SequelizeMeta table). */
import type { Sequelize } from 'sequelize';
import { Umzug, SequelizeStorage } from 'umzug';
import * as m0001 from './migrations/0001-initial';
import * as m0002 from './migrations/0002-result-maps';
import * as m0003 from './migrations/0003-password-resets';

/** Every migration in order; add new ones at the end, never edit an applied one. */
const migrations = [
  { name: '0001-initial', module: m0001 },
  { name: '0002-result-maps', module: m0002 },
  { name: '0003-password-resets', module: m0003 },
];

/** Apply all pending migrations; returns the names applied. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const umzug = new Umzug({
    migrations: migrations.map(({ name, module }) => ({
      name,
      up: async () => module.up(sequelize.getQueryInterface()),
      down: async () => module.down(sequelize.getQueryInterface()),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
  const applied = await umzug.up();
  return applied.map((m) => m.name);
}
