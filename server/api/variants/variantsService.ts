/** Variant rules: optimistic saves (409 on a stale version), copies, restores, deletion. */
import type { Model } from '@shared/schemas/model';
import type { VariantCopy, VariantCreate, VariantDetail, VariantSave } from '@shared/schemas/variants';
import type { Access } from '../../lib/permissions';
import { ConflictError, NotFoundError } from '../../lib/errors';
import { starterModel } from './starterModel';
import { recordActivity } from '../activity/activityRepository';
import * as repo from './variantsRepository';
import { toDetail } from './variantsMapper';

const where = (a: Access) => ({ projectId: a.projectId!, workspaceId: a.workspaceId });

/** The variant as the API shows it; 404 when it vanished. */
export async function detail(a: Access, id: number): Promise<VariantDetail> {
  const v = await repo.findVariant(id);
  if (!v) throw new NotFoundError('Variant');
  return toDetail(v, where(a));
}

/** 409 body for a stale write: the current version and the stored variant (newer data is kept). */
async function stale(a: Access, id: number, sent: number): Promise<ConflictError> {
  const current = await detail(a, id);
  return new ConflictError(
    'stale_version',
    `This variant was changed by someone else (you edited version ${sent}, it is now at version ${current.version}). Reload it and apply your change again.`,
    { currentVersion: current.version, current },
  );
}

/** Create a variant from the given model, else from the assembly's first variant, else a starter model. */
export async function create(a: Access, input: VariantCreate): Promise<VariantDetail> {
  const first = input.model ? null : await repo.firstVariant(a.assemblyId!);
  const model: Model = input.model ?? (first ? (JSON.parse(first.model) as Model) : starterModel());
  const id = await repo.inTransaction((t) =>
    repo.insertVariant(
      { assemblyId: a.assemblyId!, name: input.name, note: input.note, model, userId: a.userId },
      { projectId: a.projectId!, actorId: a.userId, kind: 'variant.created', summary: `created variant "${input.name}"` },
      t,
    ),
  );
  return detail(a, id);
}

/** Save a new model (and optionally name/note); an approved variant goes back to draft. */
export async function save(a: Access, id: number, input: VariantSave): Promise<VariantDetail> {
  const ok = await repo.inTransaction(async (t) => {
    const v = await repo.findVariant(id, t);
    if (!v) throw new NotFoundError('Variant');
    const status = v.status === 'approved' ? 'draft' : undefined;
    const summary = `saved version ${input.version + 1}${status ? ' (approval withdrawn: the design changed)' : ''}`;
    if (!(await repo.writeModel(id, input.version, { ...input, status, userId: a.userId, summary }, t))) return false;
    await recordActivity({ projectId: a.projectId!, variantId: id, actorId: a.userId, kind: 'variant.saved', summary: `"${input.name ?? v.name}": ${summary}` }, t);
    return true;
  });
  if (!ok) throw await stale(a, id, input.version);
  return detail(a, id);
}

/** Branch a variant: same model, new name, draft, version 1. */
export async function copy(a: Access, id: number, input: VariantCopy): Promise<VariantDetail> {
  const newId = await repo.inTransaction(async (t) => {
    const source = await repo.findVariant(id, t);
    if (!source) throw new NotFoundError('Variant');
    return repo.insertVariant(
      { assemblyId: source.assemblyId, name: input.name, note: input.note, model: JSON.parse(source.model) as Model, userId: a.userId },
      { projectId: a.projectId!, actorId: a.userId, kind: 'variant.copied', summary: `copied "${source.name}" (version ${source.version}) to "${input.name}"` },
      t,
    );
  });
  return detail(a, newId);
}

/** Restore version `n` as a new version; `expected` (if given) guards against a stale view. */
export async function restore(a: Access, id: number, n: number, expected?: number): Promise<VariantDetail> {
  const result = await repo.inTransaction(async (t) => {
    const v = await repo.findVariant(id, t);
    if (!v) throw new NotFoundError('Variant');
    const model = await repo.versionModel(id, n, t);
    if (!model) throw new NotFoundError('Version');
    const base = expected ?? v.version;
    const status = v.status === 'approved' ? 'draft' : undefined;
    const summary = `restored version ${n} as version ${base + 1}`;
    if (!(await repo.writeModel(id, base, { model, status, userId: a.userId, summary }, t))) return { ok: false, base };
    await recordActivity({ projectId: a.projectId!, variantId: id, actorId: a.userId, kind: 'variant.restored', summary: `"${v.name}": ${summary}` }, t);
    return { ok: true, base };
  });
  if (!result.ok) throw await stale(a, id, result.base);
  return detail(a, id);
}

/** Delete a variant, noting it in the project's trail. */
export async function remove(a: Access, id: number): Promise<void> {
  const v = await repo.findVariant(id);
  if (!v) throw new NotFoundError('Variant');
  await repo.deleteVariant(id);
  await recordActivity({ projectId: a.projectId!, actorId: a.userId, kind: 'variant.deleted', summary: `deleted variant "${v.name}"` });
}
