/** Typed application errors; the error middleware maps each to an HTTP status and JSON body. */

/** One failing field of a request: dotted path and a readable message. */
export interface FieldIssue {
  path: string;
  message: string;
}

/** Base of every error the API reports to a client on purpose. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** 400: the request body, query or parameters failed validation. */
export class ValidationError extends AppError {
  constructor(issues: FieldIssue[], message?: string) {
    super(400, 'validation_failed', message ?? issues.map((i) => `${i.path || '(body)'}: ${i.message}`).join('; '), { issues });
  }
}

/** 401: no signed-in user (or wrong credentials). */
export class UnauthorizedError extends AppError {
  constructor(message = 'Please sign in.', code = 'unauthorized') {
    super(401, code, message);
  }
}

/** 403: signed in, but the role does not allow this action. */
export class ForbiddenError extends AppError {
  constructor(message = 'Your role does not allow this action.', details?: unknown) {
    super(403, 'forbidden', message, details);
  }
}

/** 404: unknown id, or an id in a workspace the user does not belong to. */
export class NotFoundError extends AppError {
  constructor(what = 'Resource') {
    super(404, 'not_found', `${what} not found.`);
  }
}

/** 409: a conflicting state, e.g. a stale version or an existing record. */
export class ConflictError extends AppError {
  constructor(code: string, message: string, details?: unknown) {
    super(409, code, message, details);
  }
}
