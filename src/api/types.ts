/** Shapes of what the server answers (mirrors docs/api.md). */
import type { Model } from '@shared/schemas/model';

export type Role = 'owner' | 'engineer' | 'reviewer';
export type ReviewStatus = 'draft' | 'in_review' | 'approved' | 'changes_requested';

export interface User { id: number; email: string; name: string }
export interface Membership { workspaceId: number; workspaceName: string; role: Role }
export interface Me { user: User; memberships: Membership[] }
export interface Workspace { id: number; name: string; role?: Role }
export interface Member { userId: number; email: string; name: string; role: Role }
export interface Invitation { id: number; email: string; role: Role; expiresAt: string; usedAt?: string | null }
export type { OutboxMessage } from '@shared/schemas/invitations';
export interface Project { id: number; workspaceId: number; name: string; description?: string | null; updatedAt?: string }
export interface Assembly { id: number; projectId: number; name: string; description?: string | null; updatedAt?: string }
export interface VariantSummary {
  id: number;
  assemblyId: number;
  name: string;
  note?: string | null;
  status: ReviewStatus;
  version: number;
  updatedAt?: string;
}
export interface Variant extends VariantSummary { model: Model }
export interface VariantVersion { version: number; createdAt: string; userName?: string; userId?: number }
export interface Comment { id: number; text: string; partId?: string | null; userName?: string; createdAt: string }
export interface ActivityEvent { id: number; kind: string; message?: string; summary?: string; userName?: string; createdAt: string }
