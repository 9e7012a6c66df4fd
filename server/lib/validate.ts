/** zod validation of request bodies, queries and params → ValidationError with field paths. */
import type { z } from 'zod';
import { ValidationError } from './errors';

/** Parse `input` with `schema`; on failure throw a 400 listing each failing field's path and message. */
export function validate<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const issues = result.error.issues.slice(0, 20).map((i) => ({
    path: i.path.map(String).join('.'),
    message: i.message,
  }));
  throw new ValidationError(issues);
}
