/** The per-project activity trail. */
import type { Transaction } from 'sequelize';
import type { ActivityEvent, ActivityKind } from '@shared/schemas/review';
import { ActivityEventModel } from '../../db/models/records';
import { UserModel } from '../../db/models/accounts';

/** One event to record. */
export interface NewActivity {
  projectId: number;
  variantId?: number | null;
  actorId: number | null;
  kind: ActivityKind;
  summary: string;
}

/** Record an event (inside the caller's transaction when given). */
export async function recordActivity(e: NewActivity, transaction?: Transaction): Promise<void> {
  await ActivityEventModel.create({ ...e, variantId: e.variantId ?? null }, { transaction });
}

/** A project's events, newest first. */
export async function listActivity(projectId: number, limit = 200): Promise<ActivityEvent[]> {
  const rows = await ActivityEventModel.findAll({
    where: { projectId },
    include: [{ model: UserModel, as: 'actor', attributes: ['id', 'name'] }],
    order: [['id', 'DESC']],
    limit,
  });
  return rows.map((e) => ({
    id: e.id,
    projectId: e.projectId,
    variantId: e.variantId,
    kind: e.kind as ActivityKind,
    userId: e.actorId,
    userName: e.actor?.name ?? null,
    summary: e.summary,
    createdAt: e.createdAt.toISOString(),
  }));
}
