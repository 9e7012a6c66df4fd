/** Review of a variant: status moves with a message, comments, saved versions, restore, branch, project activity. */
import type { CommentCreate } from '@shared/schemas/review';
import type { VariantCopy, VariantStatusChange } from '@shared/schemas/variants';
import { http } from './http';
import type { ActivityEvent, Comment, Variant, VariantVersion } from './types';

/** Move a variant to another review status (the server checks role and current status). */
export const changeStatus = (vid: number, body: VariantStatusChange) => http.patch<Variant>(`/api/variants/${vid}/status`, body);

/** Comments of a variant, oldest first. */
export const fetchComments = (vid: number) => http.get<Comment[]>(`/api/variants/${vid}/comments`);

/** Add a comment, optionally pinned to a part id. */
export const postComment = (vid: number, body: CommentCreate) => http.post<Comment>(`/api/variants/${vid}/comments`, body);

/** Saved versions of a variant, newest first. */
export const fetchVersions = (vid: number) => http.get<VariantVersion[]>(`/api/variants/${vid}/versions`);

/** Restore version `n` as a new version; `version` is the one the client holds (stale → 409). */
export const restoreAsNew = (vid: number, n: number, version?: number) =>
  http.post<Variant>(`/api/variants/${vid}/versions/${n}/restore`, version === undefined ? {} : { version });

/** Branch a variant into a new draft with a name and note. */
export const branchVariant = (vid: number, body: VariantCopy) => http.post<Variant>(`/api/variants/${vid}/copy`, body);

/** A project's activity trail, newest first. */
export const fetchActivity = (pid: number, limit = 200) => http.get<ActivityEvent[]>(`/api/projects/${pid}/activity?limit=${limit}`);
