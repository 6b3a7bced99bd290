import "server-only";
import { randomUUID } from "node:crypto";
import { NextResponse } from "next/server";
import { ZodError, type z } from "zod";
import { databaseUnavailable } from "./db-unavailable";
import { AppError, type FieldErrors } from "./errors";
import { MAX_JSON_DEPTH, parseGuardedJson } from "./json-guard";
import { currentRequestId, log, logError, withRequestScope } from "./log";
import { describeError } from "./log-safe";
import { checkOrigin } from "./origin";
import { isJsonContentType, readBodyText } from "./request-body";

/** Turns zod issues into { "path.to.field": "message" }. */
export function fieldErrors(err: ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const i of err.issues) {
    const key = i.path.length ? i.path.map(String).join(".") : "_";
    if (!out[key]) out[key] = i.message;
  }
  return out;
}

/** The JSON error envelope; carries the request id (when inside route()) so a report can be matched to the log. */
export function errorResponse(status: number, code: string, message: string, fields?: FieldErrors, extra?: Record<string, unknown>) {
  const requestId = currentRequestId();
  return NextResponse.json({ error: { code, message, ...(fields ? { fields } : {}), ...(extra ?? {}), ...(requestId ? { requestId } : {}) } }, { status });
}

/** Seconds a client should wait before retrying while the database is away (the supervisor restarts it within about one). */
const DATABASE_RETRY_SECONDS = 2;

/** Maps anything thrown in a handler to the JSON error envelope; never leaks a stack trace or an internal message. */
export function toErrorResponse(e: unknown) {
  if (e instanceof AppError) return errorResponse(e.status, e.code, e.message, e.fields, e.extra);
  if (e instanceof ZodError) return errorResponse(422, "invalid", "Some fields are not valid.", fieldErrors(e));
  if (databaseUnavailable(e)) {
    // A restart or crash of PostgreSQL: say "try again" (with when), not "something broke".
    log.warn({ error: describeError(e) }, "database unavailable");
    const res = errorResponse(503, "unavailable", "The database is not answering for a moment. Your work was not changed; try again in a few seconds.");
    res.headers.set("retry-after", String(DATABASE_RETRY_SECONDS));
    return res;
  }
  logError("unhandled error in route handler", e);
  return errorResponse(500, "internal", "Something went wrong on our side. Your work was not changed; try again.");
}

type Handler<C> = (req: Request, ctx: C) => Promise<Response>;

/** An incoming X-Request-Id is kept when it is short and plain (it goes into log lines as is). */
const WELL_FORMED_ID = /^[A-Za-z0-9._:-]{8,100}$/;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The path for the log, with long opaque segments (share and invitation tokens) masked. */
function loggedPath(url: string): string {
  try {
    return new URL(url).pathname
      .split("/")
      .map((s) => (s.length >= 20 && !UUID.test(s) ? "[token]" : s))
      .join("/");
  } catch {
    return "(unreadable)";
  }
}

function withHeader(res: Response, name: string, value: string): Response {
  try {
    res.headers.set(name, value);
    return res;
  } catch {
    // A response with immutable headers (e.g. one passed through from fetch): copy it.
    const copy = new Response(res.body, res);
    copy.headers.set(name, value);
    return copy;
  }
}

/**
 * Wraps a route handler: one request id per request (on every log line, in every error answer and
 * in X-Request-Id), the Origin check for state-changing requests, and every error as the JSON envelope.
 */
export function route<C = unknown>(fn: Handler<C>): Handler<C> {
  return (req, ctx) => {
    const incoming = req.headers.get("x-request-id");
    const requestId = incoming && WELL_FORMED_ID.test(incoming) ? incoming : randomUUID();
    return withRequestScope(requestId, async () => {
      const started = performance.now();
      let res: Response;
      try {
        checkOrigin(req);
        res = await fn(req, ctx);
      } catch (e) {
        res = toErrorResponse(e);
      }
      const line = { method: req.method, path: loggedPath(req.url), status: res.status, ms: Math.round(performance.now() - started) };
      if (res.status >= 500) log.error(line, "request failed");
      else log.info(line, "request");
      return withHeader(res, "x-request-id", requestId);
    });
  };
}

const DEFAULT_MAX_BODY = 1_000_000;

/**
 * Reads a JSON body and validates it with zod. 415 for a body that is not declared as JSON; 413 as
 * soon as it passes `maxBytes` (never read whole); 422 for malformed JSON, nesting deeper than
 * MAX_JSON_DEPTH, strings PostgreSQL cannot store (U+0000, lone surrogates: refused at their path,
 * never changed) and schema failures, each with field messages.
 */
export async function parseBody<S extends z.ZodType>(req: Request, schema: S, maxBytes = DEFAULT_MAX_BODY): Promise<z.infer<S>> {
  const contentType = req.headers.get("content-type");
  const declaresBody = req.headers.has("transfer-encoding") || Number(req.headers.get("content-length") ?? 0) > 0;
  if (declaresBody && !isJsonContentType(contentType)) throw notJson();
  const text = await readBodyText(req, maxBytes);
  if (text.length && !isJsonContentType(contentType)) throw notJson();
  const read = parseGuardedJson(text);
  if (!read.ok) {
    if (read.reason === "too_deep") throw new AppError(422, "too_deep", `The body nests deeper than ${MAX_JSON_DEPTH} levels.`);
    if (read.reason === "invalid_json") throw new AppError(422, "invalid_json", "The body is not valid JSON.");
    throw new AppError(422, "invalid", "Some fields contain characters that cannot be stored.", read.fields);
  }
  const parsed = schema.safeParse(read.value);
  if (!parsed.success) throw new AppError(422, "invalid", "Some fields are not valid.", fieldErrors(parsed.error));
  return parsed.data;
}

const notJson = () => new AppError(415, "unsupported_media_type", "Send the body as JSON (Content-Type: application/json).");

/** Validates route params (e.g. ids); a malformed id answers 404 like an unknown one. */
export function parseParams<S extends z.ZodType>(params: unknown, schema: S): z.infer<S> {
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw new AppError(404, "not_found", "That record was not found.");
  return parsed.data;
}

export const json = (data: unknown, status = 200) => NextResponse.json(data, { status });
