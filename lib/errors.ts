/** Typed application errors: each code maps to one HTTP status and a message safe to show. */
export const errorStatus = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  invalid_input: 422,
  too_many_requests: 429,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof errorStatus;

export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields: FieldErrors | undefined;
  /** Seconds before a refused request may be tried again (429, 503): sent as Retry-After. */
  readonly retryAfterSeconds: number | undefined;

  constructor(
    code: ErrorCode,
    message: string,
    fields?: FieldErrors,
    options?: { retryAfterSeconds?: number },
  ) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fields = fields;
    this.retryAfterSeconds = options?.retryAfterSeconds;
  }

  get status(): number {
    return errorStatus[this.code];
  }
}
