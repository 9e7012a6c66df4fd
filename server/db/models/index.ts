/** Registers every model on a Sequelize instance. */
import type { Sequelize } from 'sequelize';
import { initAccountModels } from './accounts';
import { initDesignModels } from './designs';
import { initRecordModels } from './records';

/** Register all models (idempotent per Sequelize instance). */
export function initModels(sequelize: Sequelize): void {
  initAccountModels(sequelize);
  initDesignModels(sequelize);
  initRecordModels(sequelize);
}
