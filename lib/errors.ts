/** Errors the data-access layer raises; routes and actions turn them into answers. */
export class NotFoundError extends Error {
  readonly status = 404;
  constructor(message = "Not found.") {
    super(message);
    this.name = "NotFoundError";
  }
}

export class ForbiddenError extends Error {
  readonly status = 403;
  constructor(message = "You may not do that.") {
    super(message);
    this.name = "ForbiddenError";
  }
}

export class UnauthenticatedError extends Error {
  readonly status = 401;
  constructor(message = "Sign in first.") {
    super(message);
    this.name = "UnauthenticatedError";
  }
}

/** Bad input: messages keyed by field name, shown beside each field. */
export class ValidationError extends Error {
  readonly status = 422;
  constructor(public readonly fields: Record<string, string>, message?: string) {
    super(message ?? Object.values(fields)[0] ?? "Check the form.");
    this.name = "ValidationError";
  }
}

/** The request conflicts with the current state (e.g. the revision is frozen). */
export class ConflictError extends Error {
  readonly status = 409;
  constructor(message: string) {
    super(message);
    this.name = "ConflictError";
  }
}

/** The person must confirm who they are again (a fresh sign-in) before this step, e.g. the chair signing a decision. */
export class FreshSignInRequired extends Error {
  readonly status = 428;
  readonly code = "fresh-sign-in-required";
  constructor(message = "Confirm it is you: sign in again by e-mail link, then record this.") {
    super(message);
    this.name = "FreshSignInRequired";
  }
}

export type KnownError = NotFoundError | ForbiddenError | UnauthenticatedError | ValidationError | ConflictError | FreshSignInRequired;

export function isKnownError(err: unknown): err is KnownError {
  return (
    err instanceof NotFoundError || err instanceof ForbiddenError || err instanceof UnauthenticatedError ||
    err instanceof ValidationError || err instanceof ConflictError || err instanceof FreshSignInRequired
  );
}
