/** What routers and services share: configuration, logger, mailer and the CSRF token generator. */
import type { Request } from 'express';
import type { Config } from '../config';
import type { Logger } from './logger';
import type { Mailer } from './mailer';

/** Dependencies handed to every feature router. */
export interface AppContext {
  config: Config;
  logger: Logger;
  mailer: Mailer;
  generateCsrfToken: (req: Request, overwrite?: boolean) => string;
}
