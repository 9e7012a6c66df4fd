/** What routers and services share: configuration, logger, mailer, CSRF token generator, session control. */
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
  /** End every other session of a user (after a password change). */
  endOtherSessions: (userId: number, keepSid: string) => Promise<void>;
}
