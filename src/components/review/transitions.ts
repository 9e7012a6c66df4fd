/**
 * Review status moves a role may make from a status. Mirrors the server's table
 * (server/api/variants/reviewService.ts `transitions`), checked with the shared `can()`.
 */
import { can, type Capability, type Role } from '@shared/schemas/roles';
import type { VariantStatus } from '@shared/schemas/variants';

/** One allowed move, with the words on its button. */
export interface StatusMove {
  to: VariantStatus;
  label: string;
  /** Emphasis of the button: the main next step, a decision, or a step back. */
  kind: 'primary' | 'success' | 'warning' | 'default';
  /** Whether the move invites a message (the reason, or what to look at). */
  asksMessage: boolean;
}

interface Rule {
  from: readonly VariantStatus[];
  needs: Capability;
  label: (from: VariantStatus) => string;
  kind: StatusMove['kind'];
}

const rules: Record<VariantStatus, Rule> = {
  in_review: { from: ['draft', 'changes_requested'], needs: 'review.request', label: (f) => (f === 'draft' ? 'Request review' : 'Request review again'), kind: 'primary' },
  approved: { from: ['in_review'], needs: 'review.decide', label: () => 'Approve', kind: 'success' },
  changes_requested: { from: ['in_review'], needs: 'review.decide', label: () => 'Request changes', kind: 'warning' },
  draft: { from: ['in_review', 'changes_requested', 'approved'], needs: 'review.request', label: (f) => (f === 'in_review' ? 'Withdraw the request' : 'Back to draft'), kind: 'default' },
};

/** Moves `role` may make from `status`, in button order. */
export function statusMoves(role: Role | null | undefined, status: VariantStatus): StatusMove[] {
  return (Object.keys(rules) as VariantStatus[])
    .filter((to) => rules[to].from.includes(status) && can(role, rules[to].needs))
    .map((to) => ({ to, label: rules[to].label(status), kind: rules[to].kind, asksMessage: to !== 'draft' }));
}

/** One line on what the current status means and who acts next. */
export const statusHelp: Record<VariantStatus, string> = {
  draft: 'Being worked on. An engineer or owner asks for review when the numbers are ready.',
  in_review: 'Waiting for a reviewer or owner to approve it or to ask for changes.',
  approved: 'Approved. Saving a change to the design withdraws the approval.',
  changes_requested: 'A reviewer asked for changes; see the comments, then ask for review again.',
};
