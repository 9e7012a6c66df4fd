/** Workspaces, members, invitations and the local mail outbox. */
import { http } from './http';
import type { Invitation, Member, OutboxMessage, Role, Workspace } from './types';

export const listWorkspaces = () => http.get<Workspace[]>('/api/workspaces');
export const listMembers = (wid: number) => http.get<Member[]>(`/api/workspaces/${wid}/members`);
export const changeRole = (wid: number, uid: number, role: Role) =>
  http.patch<Member>(`/api/workspaces/${wid}/members/${uid}`, { role });
export const removeMember = (wid: number, uid: number) => http.del<void>(`/api/workspaces/${wid}/members/${uid}`);
export const listInvitations = (wid: number) => http.get<Invitation[]>(`/api/workspaces/${wid}/invitations`);
export const invite = (wid: number, email: string, role: Role) =>
  http.post<Invitation>(`/api/workspaces/${wid}/invitations`, { email, role });
export const revokeInvitation = (wid: number, id: number) => http.del<void>(`/api/workspaces/${wid}/invitations/${id}`);
export const listOutbox = (wid: number) => http.get<OutboxMessage[]>(`/api/workspaces/${wid}/outbox`);
