/** Records the API tests act on: the seeded demo ids plus fresh records made through the owner's client. */
import type { Client, TestApp } from './testApp';
import { signedIn } from './testApp';
import * as authRepo from '../../../server/api/auth/authRepository';
import { hashPassword } from '../../../server/lib/password';
import type { Role } from '../../../shared/schemas/roles';

/** Demo ids and helpers that create throw-away records. */
export interface Fixture {
  owner: Client;
  wid: number;
  pid: number;
  aid: number;
  vid: number;
  freshProject(): Promise<number>;
  freshAssembly(): Promise<number>;
  freshVariant(status?: 'draft' | 'in_review'): Promise<number>;
  freshMaterial(): Promise<number>;
  freshPartTemplate(): Promise<number>;
  freshInvitation(): Promise<number>;
  freshMember(role?: Role): Promise<number>;
}

let counter = 0;
const unique = (prefix: string) => `${prefix}-${++counter}-${Date.now().toString(36)}`;

/** A part without placement, valid for the part-template schema. */
export const templatePart = {
  name: 'Test chiplet', kind: 'compute', width: 0.01, height: 0.01,
  die: { thickness: 7e-4, kxy: 150, kz: 150 }, tim1: { thickness: 5e-5, kxy: 3, kz: 3 }, bumps: { thickness: 4e-5, kxy: 1.5, kz: 5 },
  limits: { junction: 105 },
};

/** Create a user directly in the database, member of `workspaceId` (or of a new workspace of their own). */
export async function createUser(t: TestApp, email: string, password: string, workspace: { id: number; role: Role } | { newName: string }): Promise<number> {
  const passwordHash = await hashPassword(password, t.ctx.config.argon2);
  return authRepo.inTransaction(async (tx) => {
    const u = await authRepo.createUser({ email, name: email.split('@')[0], passwordHash }, tx);
    if ('newName' in workspace) await authRepo.createWorkspaceWithOwner(workspace.newName, u.id, tx);
    else await authRepo.upsertMembership(u.id, workspace.id, workspace.role, tx);
    return u.id;
  });
}

function ok<T>(res: { status: number; body: T }, what: string): T {
  if (res.status >= 300) throw new Error(`${what} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}

/** Build the fixture on a demo-seeded app. */
export async function demoFixture(t: TestApp): Promise<Fixture> {
  const owner = await signedIn(t.app, 'owner');
  const wid = ok(await owner.get('/api/workspaces'), 'workspaces')[0].id as number;
  const pid = ok(await owner.get(`/api/workspaces/${wid}/projects`), 'projects')[0].id as number;
  const aid = ok(await owner.get(`/api/projects/${pid}/assemblies`), 'assemblies')[0].id as number;
  const vid = ok(await owner.get(`/api/assemblies/${aid}/variants`), 'variants')[0].id as number;
  const f: Fixture = {
    owner, wid, pid, aid, vid,
    freshProject: async () => ok(await owner.post(`/api/workspaces/${wid}/projects`, { name: unique('P') }), 'project').id,
    freshAssembly: async () => ok(await owner.post(`/api/projects/${pid}/assemblies`, { name: unique('A') }), 'assembly').id,
    freshVariant: async (status = 'draft') => {
      const id = ok(await owner.post(`/api/variants/${vid}/copy`, { name: unique('V') }), 'variant').id as number;
      if (status === 'in_review') ok(await owner.patch(`/api/variants/${id}/status`, { status: 'in_review' }), 'status');
      return id;
    },
    freshMaterial: async () =>
      ok(await owner.post(`/api/workspaces/${wid}/materials`, { name: unique('M'), kxy: 1, kz: 1, rho: 1000, cp: 1000 }), 'material').id,
    freshPartTemplate: async () =>
      ok(await owner.post(`/api/workspaces/${wid}/part-templates`, { name: unique('T'), part: templatePart }), 'template').id,
    freshInvitation: async () =>
      ok(await owner.post(`/api/workspaces/${wid}/invitations`, { email: `${unique('inv')}@larkspur.example`, role: 'reviewer' }), 'invitation').id,
    freshMember: async (role = 'reviewer') => createUser(t, `${unique('member')}@larkspur.example`, 'member-password-1', { id: wid, role }),
  };
  return f;
}
