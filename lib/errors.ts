export const ERROR_STATUS = {
  MALFORMED: 400,
  UNAUTHORIZED: 401,
  FORBIDDEN: 403,
  NOT_FOUND: 404,
  GONE: 410,
  INVALID_INPUT: 422,
  CONFLICT: 409,
  TOO_LARGE: 413,
  UNSUPPORTED_TYPE: 415,
  LIMIT_EXCEEDED: 429,
  UNAVAILABLE: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

/** An expected failure whose message may be shown to the user as it is. */
export class AppError extends Error {
  constructor(
    public readonly code: ErrorCode,
    message: string,
    public readonly fieldErrors?: Record<string, string[]>,
  ) {
    super(message);
    this.name = "AppError";
  }
}

export function isAppError(error: unknown): error is AppError {
  return error instanceof AppError;
}

/**
 * Messages grouped by field path, as { "runs[2].size": ["…"] }. Paths come from the client's own keys,
 * so they are gathered in a Map: a key such as "constructor" or "__proto__" must not meet Object's own.
 */
export function groupFieldErrors(entries: Iterable<readonly [string, string]>): Record<string, string[]> {
  const grouped = new Map<string, string[]>();
  for (const [path, message] of entries) {
    const list = grouped.get(path);
    if (list) list.push(message);
    else grouped.set(path, [message]);
  }
  return Object.fromEntries(grouped);
}
