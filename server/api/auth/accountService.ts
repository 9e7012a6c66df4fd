/** The signed-in user's own account: display name and password. */
import type { PasswordChangeInput } from '@shared/schemas/auth';
import type { HashCost } from '../../lib/password';
import { hashPassword, verifyPassword } from '../../lib/password';
import { UnauthorizedError, ValidationError } from '../../lib/errors';
import * as repo from './authRepository';

/** Change the display name. */
export async function rename(userId: number, name: string): Promise<void> {
  await repo.updateUser(userId, { name });
}

/** Change the password after checking the current one (401 when wrong). */
export async function changePassword(userId: number, input: PasswordChangeInput, cost: HashCost): Promise<void> {
  const hash = await repo.findPasswordHash(userId);
  if (!hash || !(await verifyPassword(hash, input.currentPassword))) {
    throw new UnauthorizedError('The current password is wrong.', 'bad_credentials');
  }
  if (input.currentPassword === input.newPassword) {
    throw new ValidationError([{ path: 'newPassword', message: 'choose a password different from the current one' }]);
  }
  await repo.updateUser(userId, { passwordHash: await hashPassword(input.newPassword, cost) });
}
