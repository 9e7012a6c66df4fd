/**
 * Refuse JSON bodies nested deeper than any Heatloom document needs (a model is about 6 levels deep).
 * A body of thousands of nested arrays passes JSON.parse but overflows the stack later — in validation,
 * or when it is copied to an engine worker thread — and would answer 5xx instead of 400.
 */
import type { RequestHandler } from 'express';
import { ValidationError } from './errors';

/** Deepest nesting of arrays and objects accepted in a request body. */
export const MAX_BODY_DEPTH = 32;

/** True when `value` nests arrays/objects more than `limit` levels deep (iterative: no recursion to overflow). */
export function deeperThan(value: unknown, limit: number): boolean {
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length) {
    const [v, d] = stack.pop()!;
    if (v === null || typeof v !== 'object') continue;
    if (d >= limit) return true;
    for (const child of Array.isArray(v) ? v : Object.values(v)) if (child !== null && typeof child === 'object') stack.push([child, d + 1]);
  }
  return false;
}

/** Middleware: 400 for a parsed body nested deeper than MAX_BODY_DEPTH. */
export function limitBodyDepth(limit = MAX_BODY_DEPTH): RequestHandler {
  return (req, _res, next) => {
    if (deeperThan(req.body, limit)) return next(new ValidationError([{ path: '', message: `The request body is nested more than ${limit} levels deep.` }]));
    next();
  };
}
