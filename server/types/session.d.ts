/** What the session stores: the signed-in user and the CSRF synchroniser token. */
import 'express-session';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
    csrfToken?: string;
  }
}
