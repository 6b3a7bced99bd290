import "server-only";
import { NextResponse } from "next/server";
import { ZodError, type z } from "zod";
import { AppError, type FieldErrors } from "./errors";

/** Turns zod issues into { "path.to.field": "message" }. */
export function fieldErrors(err: ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const i of err.issues) {
    const key = i.path.length ? i.path.map(String).join(".") : "_";
    if (!out[key]) out[key] = i.message;
  }
  return out;
}

export function errorResponse(status: number, code: string, message: string, fields?: FieldErrors, extra?: Record<string, unknown>) {
  return NextResponse.json({ error: { code, message, ...(fields ? { fields } : {}), ...(extra ?? {}) } }, { status });
}

/** Maps anything thrown in a handler to the JSON error envelope; never leaks a stack trace. */
export function toErrorResponse(e: unknown) {
  if (e instanceof AppError) return errorResponse(e.status, e.code, e.message, e.fields, e.extra);
  if (e instanceof ZodError) return errorResponse(422, "invalid", "Some fields are not valid.", fieldErrors(e));
  console.error("unhandled error in route handler", e);
  return errorResponse(500, "internal", "Something went wrong on our side. Your work was not changed; try again.");
}

type Handler<C> = (req: Request, ctx: C) => Promise<Response>;

/** Wraps a route handler so every error becomes the JSON envelope. */
export function route<C = unknown>(fn: Handler<C>): Handler<C> {
  return async (req, ctx) => {
    try {
      return await fn(req, ctx);
    } catch (e) {
      return toErrorResponse(e);
    }
  };
}

const DEFAULT_MAX_BODY = 1_000_000;

/** Reads a JSON body with a size limit (413) and validates it with zod (422 with field messages). */
export async function parseBody<S extends z.ZodType>(req: Request, schema: S, maxBytes = DEFAULT_MAX_BODY): Promise<z.infer<S>> {
  const declared = Number(req.headers.get("content-length") ?? 0);
  if (declared > maxBytes) throw new AppError(413, "too_large", `The body is larger than ${Math.round(maxBytes / 1000)} kB.`);
  const text = await req.text();
  if (Buffer.byteLength(text) > maxBytes) throw new AppError(413, "too_large", `The body is larger than ${Math.round(maxBytes / 1000)} kB.`);
  let raw: unknown;
  try {
    raw = text.length ? JSON.parse(text) : undefined;
  } catch {
    throw new AppError(422, "invalid_json", "The body is not valid JSON.");
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw new AppError(422, "invalid", "Some fields are not valid.", fieldErrors(parsed.error));
  return parsed.data;
}

/** Validates route params (e.g. ids); a malformed id answers 404 like an unknown one. */
export function parseParams<S extends z.ZodType>(params: unknown, schema: S): z.infer<S> {
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw new AppError(404, "not_found", "That record was not found.");
  return parsed.data;
}

export const json = (data: unknown, status = 200) => NextResponse.json(data, { status });
