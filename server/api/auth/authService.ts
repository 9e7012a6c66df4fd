/** Sign-up of the first owner, sign-in checks and the "me" view. */
import type { LoginInput, Me, SetupInput } from '@shared/schemas/auth';
import type { HashCost } from '../../lib/password';
import { hashPassword, verifyPassword } from '../../lib/password';
import { ConflictError, UnauthorizedError } from '../../lib/errors';
import * as repo from './authRepository';

/** A hash to verify against when the e-mail is unknown, so both paths take similar time. */
let dummyHash: string | null = null;

/** True when no account exists yet. */
export async function setupNeeded(): Promise<boolean> {
  return (await repo.countUsers()) === 0;
}

/** Create the first owner and their workspace; 409 once any user exists. Returns the new user id. */
export async function setup(input: SetupInput, cost: HashCost): Promise<number> {
  const passwordHash = await hashPassword(input.password, cost);
  return repo.inTransaction(async (t) => {
    if ((await repo.countUsers()) > 0) throw new ConflictError('setup_done', 'Heatloom is already set up; sign in instead.');
    const user = await repo.createUser({ email: input.email, name: input.name, passwordHash }, t);
    await repo.createWorkspaceWithOwner(input.workspaceName, user.id, t);
    return user.id;
  });
}

/** Check credentials; returns the user id or throws 401 with one message for both unknown e-mail and wrong password. */
export async function login(input: LoginInput, cost: HashCost): Promise<number> {
  const user = await repo.findUserByEmail(input.email);
  if (!user) {
    dummyHash ??= await hashPassword('not-a-real-password', cost);
    await verifyPassword(dummyHash, input.password);
    throw new UnauthorizedError('E-mail or password is wrong.', 'bad_credentials');
  }
  if (!(await verifyPassword(user.passwordHash, input.password))) {
    throw new UnauthorizedError('E-mail or password is wrong.', 'bad_credentials');
  }
  return user.id;
}

/** The signed-in user and their workspaces; null if the account no longer exists. */
export async function me(userId: number): Promise<Me | null> {
  const user = await repo.findUser(userId);
  if (!user) return null;
  return { user, memberships: await repo.listMemberships(userId) };
}
