/** Review status changes and the e-mail notice they send to the workspace's owners and engineers. */
import { statusTransitions, type VariantDetail, type VariantStatus } from '@shared/schemas/variants';
import { can } from '@shared/schemas/roles';
import type { AppContext } from '../../lib/context';
import type { Access } from '../../lib/permissions';
import { ConflictError, ForbiddenError, NotFoundError } from '../../lib/errors';
import { recordActivity } from '../activity/activityRepository';
import { memberEmails } from '../workspaces/workspacesRepository';
import { findUser } from '../auth/authRepository';
import * as repo from './variantsRepository';
import { detail } from './variantsService';
import { reviewMail } from './reviewMail';

const labels: Record<VariantStatus, string> = {
  draft: 'draft', in_review: 'in review', approved: 'approved', changes_requested: 'changes requested',
};

/** Move a variant to `to`: checks the role (403) and the current status (409), logs activity, mails a notice. */
export async function changeStatus(ctx: AppContext, a: Access, id: number, to: VariantStatus, message?: string): Promise<VariantDetail> {
  const rule = statusTransitions[to];
  if (!can(a.role, rule.needs)) throw new ForbiddenError(`A ${a.role} may not set a variant to "${labels[to]}".`, { capability: rule.needs, role: a.role });
  const v = await repo.findVariant(id);
  if (!v) throw new NotFoundError('Variant');
  const from = v.status;
  if (!rule.from.includes(from)) {
    throw new ConflictError('invalid_transition', `A variant that is ${labels[from]} cannot be set to ${labels[to]}.`, { status: from });
  }
  const ok = await repo.inTransaction(async (t) => {
    if (!(await repo.writeStatus(id, from, to, a.userId, t))) return false;
    const note = message ? `: ${message}` : '';
    await recordActivity({ projectId: a.projectId!, variantId: id, actorId: a.userId, kind: 'variant.status', summary: `"${v.name}" ${labels[from]} → ${labels[to]}${note}` }, t);
    return true;
  });
  if (!ok) throw new ConflictError('invalid_transition', 'The status changed meanwhile; reload the variant.', { status: (await repo.findVariant(id))?.status });
  const result = await detail(a, id);
  if (to !== 'draft') await notify(ctx, a, result, to, message);
  return result;
}

async function notify(ctx: AppContext, a: Access, v: VariantDetail, to: VariantStatus, message?: string): Promise<void> {
  const recipients = (await memberEmails(a.workspaceId, ['owner', 'engineer'])).filter((r) => r.userId !== a.userId).map((r) => r.email);
  if (!recipients.length) return;
  const actor = (await findUser(a.userId))?.name ?? 'A colleague';
  const link = `${ctx.config.publicUrl}/variants/${v.id}`;
  await ctx.mailer.send({ to: recipients, workspaceId: a.workspaceId, ...reviewMail({ actor, variant: v.name, status: labels[to], link, message }) });
}
