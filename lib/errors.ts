/** Errors the data-access layer raises; routes and actions turn them into answers with their status. */
export abstract class KnownError extends Error {
  abstract readonly status: number;
  /** A stable code the client can act on, where the status alone is not enough. */
  readonly code?: string;
  constructor(message: string) {
    super(message);
    this.name = new.target.name;
  }
}

export class NotFoundError extends KnownError {
  readonly status = 404;
  constructor(message = "Not found.") { super(message); }
}

export class ForbiddenError extends KnownError {
  readonly status = 403;
  constructor(message = "You may not do that.") { super(message); }
}

export class UnauthenticatedError extends KnownError {
  readonly status = 401;
  constructor(message = "Sign in first.") { super(message); }
}

/** Bad input: messages keyed by field name, shown beside each field. */
export class ValidationError extends KnownError {
  readonly status = 422;
  constructor(public readonly fields: Record<string, string>, message?: string) {
    super(message ?? Object.values(fields)[0] ?? "Check the form.");
  }
}

/** The request conflicts with the current state (e.g. the revision is frozen). */
export class ConflictError extends KnownError {
  readonly status = 409;
}

/** The person must confirm who they are again (a fresh sign-in) before this step, e.g. the chair signing a decision. */
export class FreshSignInRequired extends KnownError {
  readonly status = 428;
  readonly code = "fresh-sign-in-required";
  constructor(message = "Confirm it is you: sign in again by e-mail link, then record this.") { super(message); }
}

export function isKnownError(err: unknown): err is KnownError {
  return err instanceof KnownError;
}
