/** Typed application errors: each code maps to one HTTP status and a message safe to show. */
export const errorStatus = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  invalid_input: 422,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof errorStatus;

export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields: FieldErrors | undefined;

  constructor(code: ErrorCode, message: string, fields?: FieldErrors) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fields = fields;
  }

  get status(): number {
    return errorStatus[this.code];
  }
}
