/** Typed errors of the thermal engine: bad input, and limits the engine refuses to exceed. */

/** One problem in the input: where it is (dotted field path) and what is wrong, in plain words. */
export interface InputIssue {
  path: string;
  message: string;
}

/** Bad input to the engine: `path` names the field (e.g. "above.layers[0].thickness"). */
export class EngineInputError extends Error {
  readonly code = 'ENGINE_INPUT';
  readonly path: string;
  /** Every problem found (the first one is also in `path` / `message`). */
  readonly issues: InputIssue[];

  constructor(path: string, message: string, issues?: InputIssue[]) {
    super(message);
    this.name = 'EngineInputError';
    this.path = path;
    this.issues = issues && issues.length > 0 ? issues : [{ path, message }];
  }
}

/** Format a zod-style path (array of keys) as "a.b[0].c". */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out;
}
