/**
 * Thrown when a design or site cannot be reviewed as entered (negative length,
 * zero modules, a conductor size the tables do not hold). `field` points at the
 * offending input so a form can show the message beside it.
 */
export class DesignInputError extends Error {
  readonly code = "INVALID_DESIGN" as const;
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "DesignInputError";
  }
}

export function requirePositive(value: number, field: string, what: string): number {
  if (!Number.isFinite(value) || value <= 0) {
    throw new DesignInputError(field, `${what} must be a number greater than zero.`);
  }
  return value;
}

export function requireNonNegative(value: number, field: string, what: string): number {
  if (!Number.isFinite(value) || value < 0) {
    throw new DesignInputError(field, `${what} must be zero or more.`);
  }
  return value;
}

export function requireWholePositive(value: number, field: string, what: string): number {
  if (!Number.isInteger(value) || value < 1) {
    throw new DesignInputError(field, `${what} must be a whole number of at least 1.`);
  }
  return value;
}

export function requireFinite(value: number, field: string, what: string): number {
  if (!Number.isFinite(value)) throw new DesignInputError(field, `${what} must be a number.`);
  return value;
}

/** A figure the entries may not allow yet: its value, or null where the engine raises a DesignInputError (reported elsewhere). */
export function unlessInputError<T>(compute: () => T): T | null {
  try {
    return compute();
  } catch (err) {
    if (err instanceof DesignInputError) return null;
    throw err;
  }
}
