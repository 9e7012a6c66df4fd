/** Small shared pieces of the API contract: id params, error body, trimmed strings. */
import { z } from 'zod';

/** Positive integer id from a URL parameter. */
export const idParam = z.coerce.number().int().positive().max(2 ** 31);

/** Trimmed, non-empty display name. */
export const nameSchema = z.string().trim().min(1, 'required').max(120);

/** Optional free-text note (may be empty). */
export const noteSchema = z.string().max(4000).default('');

/** E-mail address, lower-cased. */
export const emailSchema = z.string().trim().toLowerCase().pipe(z.email('enter a valid e-mail address').max(254));

/** Password policy: 10–200 characters. */
export const passwordSchema = z.string().min(10, 'at least 10 characters').max(200);

/** Error body of every failing API call. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().nullable(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
