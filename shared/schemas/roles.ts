/** Workspace roles and what each may do: the one permission table, enforced by the server and mirrored by the client. */
import { z } from 'zod';

export const roles = ['owner', 'engineer', 'reviewer'] as const;
/** A member's role in one workspace. */
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** Every action a route may require. */
export const capabilities = [
  'workspace.read', // see the workspace, its projects, variants, library, comments, activity
  'workspace.manage', // rename the workspace
  'members.manage', // change roles, remove members
  'invitations.manage', // invite, list and revoke invitations
  'outbox.read', // read the local mail outbox
  'project.delete', // delete a whole project
  'design.edit', // create/edit/copy/delete projects, assemblies, variants; restore versions
  'library.edit', // create/edit/delete materials and part templates
  'analysis.run', // run and store solver results
  'comment.write', // comment on variants
  'review.request', // move a variant to in review (or back to draft)
  'review.decide', // approve or request changes
] as const;
export type Capability = (typeof capabilities)[number];

/** Role → capabilities. Owner: everything; engineer: design work; reviewer: read, comment, decide. */
export const roleCapabilities: Record<Role, readonly Capability[]> = {
  owner: capabilities,
  engineer: ['workspace.read', 'design.edit', 'library.edit', 'analysis.run', 'comment.write', 'review.request'],
  reviewer: ['workspace.read', 'comment.write', 'review.decide'],
};

/** True when `role` grants `capability`. */
export function can(role: Role | null | undefined, capability: Capability): boolean {
  return role ? roleCapabilities[role].includes(capability) : false;
}
