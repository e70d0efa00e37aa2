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

/** One refused field: its dotted path inside the submitted object (react-hook-form's naming), "" for the whole. */
export interface FieldIssue {
  path: string;
  message: string;
}

/** Input that passed the schema but breaks a rule that needs the database to check (e.g. a duplicate). */
export class InputError extends Error {
  readonly kind = "input" as const;
  readonly issues: FieldIssue[];
  constructor(message: string, readonly field?: string, issues?: FieldIssue[]) {
    super(message);
    this.name = "InputError";
    this.issues = issues ?? [{ path: field ?? "", message }];
  }
}

export type KnownError = ForbiddenError | NotFoundError | InputError;

export function isKnownError(err: unknown): err is KnownError {
  return err instanceof ForbiddenError || err instanceof NotFoundError || err instanceof InputError;
}
