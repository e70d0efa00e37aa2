// Typed failures thrown by lib functions. Server actions and console routes map them to a result or a
// problem+json response; nothing else needs to know how a refusal is shown.

export class ForbiddenError extends Error {
  readonly kind = "forbidden" as const;
  constructor(message = "Your role does not allow this.") {
    super(message);
    this.name = "ForbiddenError";
  }
}

export class NotFoundError extends Error {
  readonly kind = "not_found" as const;
  constructor(message = "Not found.") {
    super(message);
    this.name = "NotFoundError";
  }
}

/** Input that passed the schema but breaks a rule that needs the database to check (e.g. a duplicate). */
export class InputError extends Error {
  readonly kind = "input" as const;
  constructor(message: string, readonly field?: string) {
    super(message);
    this.name = "InputError";
  }
}

export type KnownError = ForbiddenError | NotFoundError | InputError;

export function isKnownError(err: unknown): err is KnownError {
  return err instanceof ForbiddenError || err instanceof NotFoundError || err instanceof InputError;
}
