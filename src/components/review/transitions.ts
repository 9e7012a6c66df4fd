/**
 * Review status moves a role may make from a status: the table the server enforces
 * (`statusTransitions` in shared/schemas/variants.ts), checked with the shared `can()`, plus button words.
 */
import { can, type Role } from '@shared/schemas/roles';
import { statusTransitions, type VariantStatus } from '@shared/schemas/variants';

/** One allowed move, with the words on its button. */
export interface StatusMove {
  to: VariantStatus;
  label: string;
  /** Emphasis of the button: the main next step, a decision, or a step back. */
  kind: 'primary' | 'success' | 'warning' | 'default';
  /** Whether the move invites a message (the reason, or what to look at). */
  asksMessage: boolean;
}

/** Button words and emphasis per target status, in button order. */
const buttons: Record<VariantStatus, { label: (from: VariantStatus) => string; kind: StatusMove['kind'] }> = {
  in_review: { label: (f) => (f === 'draft' ? 'Request review' : 'Request review again'), kind: 'primary' },
  approved: { label: () => 'Approve', kind: 'success' },
  changes_requested: { label: () => 'Request changes', kind: 'warning' },
  draft: { label: (f) => (f === 'in_review' ? 'Withdraw the request' : 'Back to draft'), kind: 'default' },
};

/** Moves `role` may make from `status`, in button order. */
export function statusMoves(role: Role | null | undefined, status: VariantStatus): StatusMove[] {
  return (Object.keys(buttons) as VariantStatus[])
    .filter((to) => statusTransitions[to].from.includes(status) && can(role, statusTransitions[to].needs))
    .map((to) => ({ to, label: buttons[to].label(status), kind: buttons[to].kind, asksMessage: to !== 'draft' }));
}

/** One line on what the current status means and who acts next. */
export const statusHelp: Record<VariantStatus, string> = {
  draft: 'Being worked on. An engineer or owner asks for review when the numbers are ready.',
  in_review: 'Waiting for a reviewer or owner to approve it or to ask for changes.',
  approved: 'Approved. Saving a change to the design withdraws the approval.',
  changes_requested: 'A reviewer asked for changes; see the comments, then ask for review again.',
};
