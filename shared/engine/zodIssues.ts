/** Turn a zod validation failure into an EngineInputError with field paths. */
import type { z } from 'zod';
import { EngineInputError, formatPath } from './errors';

/** Parse `body` with `schema`; throw EngineInputError listing every issue when it does not fit. */
export function parseOrThrow<S extends z.ZodType>(schema: S, body: unknown): z.infer<S> {
  const parsed = schema.safeParse(body);
  if (parsed.success) return parsed.data;
  const issues = parsed.error.issues.map((issue) => {
    const path = formatPath(issue.path);
    const message = issue.code === 'unrecognized_keys' ? `Unknown field(s): ${issue.keys.join(', ')}.` : issue.message;
    return { path, message: path ? `${path}: ${message}` : message };
  });
  throw new EngineInputError(issues[0].path, issues[0].message, issues);
}
