/** Session helpers: sign in with a fresh session id (no fixation) and a fresh CSRF token; sign out. */
import type { Request } from 'express';
import type { Me } from '@shared/schemas/auth';
import { me } from './authService';
import { UnauthorizedError } from '../../lib/errors';

/** Regenerate the session, bind it to `userId`, issue a new CSRF token; returns "me" with that token. */
export async function startSession(req: Request, userId: number, generateToken: (req: Request, overwrite?: boolean) => string): Promise<Me> {
  await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
  req.session.userId = userId;
  const csrfToken = generateToken(req, true);
  await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
  const view = await me(userId);
  if (!view) throw new UnauthorizedError();
  return { ...view, csrfToken };
}

/** Destroy the session. */
export function endSession(req: Request): Promise<void> {
  return new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
}
