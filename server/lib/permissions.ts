/** Server-side role checks over the shared role → capability table (shared/schemas/roles.ts). */
import type { Request } from 'express';
import { can, type Capability, type Role } from '@shared/schemas/roles';
import { idParam } from '@shared/schemas/common';
import * as access from '../api/access/accessRepository';
import { ForbiddenError, NotFoundError, UnauthorizedError } from './errors';

/** What kind of record a route acts on. */
export type Target = access.Target;

/** A granted access: who, where, with which role. */
export interface Access extends access.Location {
  userId: number;
  role: Role;
}

const labels: Record<Target, string> = {
  workspace: 'Workspace', project: 'Project', assembly: 'Assembly', variant: 'Variant', comment: 'Comment', material: 'Material', partTemplate: 'Part template',
};

/** The signed-in user's id, or a 401. */
export function requireUserId(req: Request): number {
  const id = req.session?.userId;
  if (!id) throw new UnauthorizedError();
  return id;
}

/** Parse a positive integer route id; anything else is an unknown record (404). */
export function parseId(raw: unknown, what: string): number {
  const r = idParam.safeParse(raw);
  if (!r.success) throw new NotFoundError(what);
  return r.data;
}

/**
 * Check that the signed-in user may do `capability` on the record `target` with id `rawId`.
 * Unknown records and records of workspaces the user is not in are both 404; a member
 * whose role lacks the capability gets 403.
 */
export async function authorize(req: Request, target: Target, rawId: unknown, capability: Capability): Promise<Access> {
  const userId = requireUserId(req);
  const id = parseId(rawId, labels[target]);
  const found = await access.locateWithRole(target, id, userId);
  if (!found?.role) throw new NotFoundError(labels[target]);
  const { location, role } = found;
  if (!can(role, capability)) throw new ForbiddenError(`A ${role} may not do this (needs ${capability}).`, { capability, role });
  return { ...location, userId, role };
}
