/** Variants: read, save with version, branch, history, review status, comments. */
import type { Model } from '@shared/schemas/model';
import { http } from './http';
import type { Comment, ReviewStatus, Variant, VariantSummary, VariantVersion } from './types';

export const listVariants = (aid: number) => http.get<VariantSummary[]>(`/api/assemblies/${aid}/variants`);
export const getVariant = (vid: number) => http.get<Variant>(`/api/variants/${vid}`);
export const createVariant = (aid: number, body: { name: string; note?: string; model?: Model }) =>
  http.post<Variant>(`/api/assemblies/${aid}/variants`, body);
export const saveVariant = (vid: number, body: { model: Model; version: number; name?: string; note?: string }) =>
  http.put<Variant>(`/api/variants/${vid}`, body);
export const copyVariant = (vid: number, body: { name: string; note?: string }) =>
  http.post<Variant>(`/api/variants/${vid}/copy`, body);
export const listVersions = (vid: number) => http.get<VariantVersion[]>(`/api/variants/${vid}/versions`);
export const restoreVersion = (vid: number, n: number) => http.post<Variant>(`/api/variants/${vid}/versions/${n}/restore`);
export const setStatus = (vid: number, status: ReviewStatus) =>
  http.patch<Variant>(`/api/variants/${vid}/status`, { status });
export const listComments = (vid: number) => http.get<Comment[]>(`/api/variants/${vid}/comments`);
export const addComment = (vid: number, text: string, partId?: string) =>
  http.post<Comment>(`/api/variants/${vid}/comments`, { text, partId });
