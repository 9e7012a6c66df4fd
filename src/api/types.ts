/** Shapes of what the server answers: the shared zod schemas are the one contract. */
export type { Role } from '@shared/schemas/roles';
export type { User, MembershipSummary as Membership, Me } from '@shared/schemas/auth';
export type { Workspace, Member } from '@shared/schemas/workspaces';
export type { Invitation, OutboxMessage } from '@shared/schemas/invitations';
export type { Project, Assembly } from '@shared/schemas/projects';
export type {
  VariantStatus as ReviewStatus,
  VariantSummary,
  VariantDetail as Variant,
  VariantVersion,
} from '@shared/schemas/variants';
export type { Comment, ActivityEvent } from '@shared/schemas/review';
export type { Material, PartTemplate } from '@shared/schemas/library';
