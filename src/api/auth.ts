/** Sign-in, sign-out, first-owner set-up, invitations and password reset. */
import { http, resetCsrf } from './http';
import type { Me, Role } from './types';

/** Who is signed in (401 → ApiError). */
export const fetchMe = () => http.get<Me>('/api/auth/me');
/** Whether the first owner still has to be created. */
export const fetchSetupNeeded = () => http.get<{ needed: boolean }>('/api/auth/setup');

/** Sign in; the session changes so the CSRF token is refreshed. */
export async function login(email: string, password: string): Promise<void> {
  await http.post('/api/auth/login', { email, password });
  resetCsrf();
}

/** Sign out. */
export async function logout(): Promise<void> {
  await http.post('/api/auth/logout');
  resetCsrf();
}

/** Create the first owner and workspace. */
export async function setupOwner(body: { email: string; name: string; password: string; workspaceName: string }) {
  await http.post('/api/auth/setup', body);
  resetCsrf();
}

/** Public look-up of an invitation by its token. */
export const fetchInvitation = (token: string) =>
  http.get<{ workspaceName: string; email: string; role: Role }>(`/api/invitations/${encodeURIComponent(token)}`);

/** Accept an invitation: set name and password, join, and be signed in. */
export async function acceptInvitation(token: string, body: { name: string; password: string }) {
  await http.post(`/api/invitations/${encodeURIComponent(token)}/accept`, body);
  resetCsrf();
}

/** Ask for a password-reset link by e-mail; the answer is the same whether or not an account uses the address. */
export const requestPasswordReset = (email: string) => http.post<{ message: string }>('/api/auth/password-reset', { email });

/** Public look-up of a password-reset link: whose password it sets (404 when unknown, used or expired). */
export const fetchPasswordReset = (token: string) => http.get<{ email: string }>(`/api/auth/password-reset/${encodeURIComponent(token)}`);

/** Set a new password with a reset link; every session of that account ends (this one's CSRF token too). */
export async function resetPassword(token: string, password: string): Promise<void> {
  await http.post(`/api/auth/password-reset/${encodeURIComponent(token)}`, { password });
  resetCsrf();
}
