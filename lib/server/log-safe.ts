/**
 * What of a caught error may be logged. Database driver errors embed the failing statement with
 * its values ("insert into ... values ('$2b$...') - duplicate key ..."): only the database's own
 * sentence is kept, and quoted literals, bcrypt hashes and long tokens in it are masked.
 */
export interface LoggedError {
  class: string;
  /** PostgreSQL SQLSTATE or a Node error code, when there is one. */
  code?: string;
  constraint?: string;
  table?: string;
  message: string;
  /** Stack frames only (the first line, which repeats the message, is dropped). */
  stack?: string;
}

/** Keys whose values never reach the log, at any of the first three levels of a logged object. */
const SECRET_KEYS = ["password", "passwordHash", "password_hash", "currentPassword", "newPassword", "token", "secret", "cookie", "authorization", "csrfToken", "sessionToken", "set-cookie", "x-api-key"];
/** pino redact paths for SECRET_KEYS (a hyphenated key is written in brackets). */
export const REDACT_PATHS = SECRET_KEYS.flatMap((k) => {
  const key = /^[A-Za-z_$][\w$]*$/.test(k) ? k : `["${k}"]`;
  const dot = key.startsWith("[") ? "" : ".";
  return [key, `*${dot}${key}`, `*.*${dot}${key}`];
});

const SQL_START = /^\s*(select|insert|update|delete|with|begin|commit|rollback|create|alter|drop|truncate|savepoint|release|set|lock|copy)\b/i;
const BCRYPT = /\$2[abxy]?\$\d{2}\$[./A-Za-z0-9]{53}/g;
const QUOTED = /'(?:[^']|'')*'/g;
/** Long opaque runs (tokens, secrets, base64): 24 or more characters without a space. */
const OPAQUE = /[A-Za-z0-9+/_=-]{24,}/g;
const MAX_MESSAGE = 500;

/** Masks values that must not reach a log in a free-text message. */
export function scrubMessage(message: string): string {
  let m = message;
  if (SQL_START.test(m)) {
    // The driver's format is "<statement with values> - <database message>"; keep the latter.
    const cut = m.lastIndexOf(" - ");
    m = cut >= 0 ? m.slice(cut + 3) : "(statement omitted)";
  }
  m = m.replace(BCRYPT, "[hash]").replace(QUOTED, "'?'").replace(OPAQUE, "[masked]");
  return m.length > MAX_MESSAGE ? `${m.slice(0, MAX_MESSAGE)}...` : m;
}

const str = (v: unknown) => (typeof v === "string" && v.length <= 100 ? v : undefined);

/** The loggable facts of anything thrown. */
export function describeError(e: unknown): LoggedError {
  if (!(e instanceof Error)) return { class: typeof e, message: "a non-error value was thrown" };
  const o = e as Error & Record<string, unknown>;
  const code = str(o.code) ?? str(o.sqlState);
  const stackLines = (e.stack ?? "").split("\n");
  const frames = stackLines.filter((l) => /^\s+at /.test(l)).slice(0, 12);
  return {
    class: e.constructor?.name || e.name || "Error",
    ...(code ? { code } : {}),
    ...(str(o.constraint) ? { constraint: str(o.constraint) } : {}),
    ...(str(o.table) ? { table: str(o.table) } : {}),
    message: scrubMessage(e.message ?? ""),
    ...(frames.length ? { stack: frames.join("\n") } : {}),
  };
}
