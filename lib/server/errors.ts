/** Errors services throw; route handlers map them to HTTP statuses with lib/server/http.ts. */
export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const unauthorized = (msg = "Sign in to continue.") => new AppError(401, "unauthorized", msg);
export const forbidden = (msg = "You do not have access to this.") => new AppError(403, "forbidden", msg);
export const notFound = (what = "That record") => new AppError(404, "not_found", `${what} was not found.`);
export const invalid = (message: string, fields?: FieldErrors) => new AppError(422, "invalid", message, fields);
export const conflict = (message: string, extra?: Record<string, unknown>) => new AppError(409, "stale_version", message, undefined, extra);
export const tooMany = (message: string) => new AppError(429, "too_many_attempts", message);
