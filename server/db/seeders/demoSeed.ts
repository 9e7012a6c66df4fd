/** Seeds the invented demo workspace when the database has no users. */
import type { HashCost } from '../../lib/password';
import { hashPassword } from '../../lib/password';
import { DEMO_WORKSPACE, demoUsers } from './demoUsers';
import { demoContent } from './demoContent';
import * as repo from './seedRepository';

/** Seed the demo (users, workspace, project, assembly, variants, materials); false when users already exist. */
export async function seedDemoIfEmpty(cost: HashCost): Promise<boolean> {
  if ((await repo.countUsers()) > 0) return false;
  const users = Object.values(demoUsers);
  const hashes = await Promise.all(users.map((u) => hashPassword(u.password, cost)));
  const content = demoContent();
  return repo.inTransaction(async (t) => {
    if ((await repo.countUsers(t)) > 0) return false;
    const workspaceId = await repo.createWorkspace(DEMO_WORKSPACE, t);
    const userIds: number[] = [];
    for (const [i, u] of users.entries()) {
      userIds.push(await repo.createMember({ email: u.email, name: u.name, passwordHash: hashes[i] }, workspaceId, u.role, t));
    }
    const engineerId = userIds[users.findIndex((u) => u.role === 'engineer')];
    const projectId = await repo.createProject(workspaceId, content.project, engineerId, t);
    const assemblyId = await repo.createAssembly(projectId, content.assembly, t);
    for (const v of content.variants) await repo.createVariant(projectId, assemblyId, v, engineerId, t);
    for (const m of content.materials) await repo.createMaterial(workspaceId, m, t);
    return true;
  });
}
