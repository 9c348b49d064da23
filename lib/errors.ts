// Typed error codes and the one place that maps them to HTTP status codes.
export const ERROR_STATUS = {
  BAD_REQUEST: 400,
  VALIDATION: 400,
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  GONE: 410,
  PAYLOAD_TOO_LARGE: 413,
  // The request is well formed but the record is not ready for it (e.g. publishing with a blocking finding).
  BLOCKED: 422,
  UNSUPPORTED_MEDIA_TYPE: 415,
  RATE_LIMITED: 429,
  INTERNAL: 500,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;
export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields?: FieldErrors;
  /** Every reason, when there can be several (e.g. what stops a programme being published). */
  readonly reasons?: string[];

  constructor(code: ErrorCode, message: string, fields?: FieldErrors, reasons?: string[]) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fields = fields;
    this.reasons = reasons;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export const notSignedIn = () => new AppError("UNAUTHENTICATED", "Please sign in to continue.");
export const forbidden = () => new AppError("FORBIDDEN", "Your role does not allow this.");
// Records outside someone's reach are reported as missing, so their existence is not revealed.
export const notFound = (what = "That record") => new AppError("NOT_FOUND", `${what} was not found.`);

export type ErrorBody = { error: { code: ErrorCode; message: string; fields?: FieldErrors; reasons?: string[] } };

export function errorBody(error: AppError): ErrorBody {
  return {
    error: {
      code: error.code,
      message: error.message,
      ...(error.fields ? { fields: error.fields } : {}),
      ...(error.reasons ? { reasons: error.reasons } : {}),
    },
  };
}
