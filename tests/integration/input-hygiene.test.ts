/**
 * Regression tests for bodies and addresses that used to answer 500, leak internal text or be read
 * whole: each answers a 4xx with the JSON envelope and a request id, and nothing bad is stored.
 */
import http from "node:http";
import { describe, it, expect, beforeAll } from "vitest";
import { BASE_URL, hasServer, newMember, type Client } from "./helpers/client";
import { sampleDoc } from "./helpers/sharing";

const INTERNAL = /Maximum call stack|RangeError|TypeError|SyntaxError|\bat [\w.<>]+ \(|Error:|node_modules|\binsert into\b|\bselect\b.*\bfrom\b/i;

async function send(path: string, init: RequestInit & { cookie?: string } = {}) {
  const headers = new Headers(init.headers);
  if (init.cookie) headers.set("cookie", init.cookie);
  const res = await fetch(BASE_URL + path, { ...init, headers, redirect: "manual" });
  const text = await res.text();
  let body: any = text;
  try {
    body = JSON.parse(text);
  } catch {
    /* keep the text */
  }
  return { status: res.status, body, text, headers: res.headers };
}

/** Every error answer: the envelope, a request id matching the header, and no internal text. */
function expectEnvelope(r: { status: number; body: any; text: string; headers: Headers }, status: number, code?: string) {
  expect(r.status).toBe(status);
  expect(r.body?.error?.message).toEqual(expect.any(String));
  if (code) expect(r.body.error.code).toBe(code);
  expect(r.body.error.requestId).toMatch(/^[A-Za-z0-9._:-]{8,100}$/);
  expect(r.headers.get("x-request-id")).toBe(r.body.error.requestId);
  expect(r.text).not.toMatch(INTERNAL);
}

describe.skipIf(!hasServer)("input hygiene: bad addresses and bodies answer 4xx, never 500", () => {
  let alice: Client;
  let cookie = "";
  let planId = "";
  beforeAll(async () => {
    alice = (await newMember("hygiene")).client;
    cookie = alice.cookieHeader();
    planId = (await alice.post("/api/v1/plans", { name: "Hygiene", document: sampleDoc() })).body.plan.id;
  });

  it("DELETE /api/v1/plans/%ff%fe (invalid percent-encoding) answers 400 with the envelope", async () => {
    for (const path of ["/api/v1/plans/%ff%fe", "/api/v1/shared/%ed%a0%80", "/api/v1/plans/%E0%A4%A/links"]) {
      expectEnvelope(await send(path, { method: "DELETE", cookie }), 400, "bad_path");
    }
    expectEnvelope(await send("/api/v1/plans/%ff%fe", { cookie }), 400, "bad_path");
    // A well-formed but unknown id stays a 404.
    expectEnvelope(await send("/api/v1/plans/%41bc", { method: "DELETE", cookie }), 404);
    // A link token with U+0000 in it is an unknown link, not a database error.
    expect((await send("/api/v1/shared/abc%00def")).status).toBe(404);
  });

  it("refuses U+0000 in any string with a field message at its path (and stores nothing)", async () => {
    const r = await send("/api/v1/plans", { method: "POST", cookie, headers: { "content-type": "application/json" }, body: JSON.stringify({ name: "Saw\u0000bench" }) });
    expectEnvelope(r, 422, "invalid");
    expect(r.body.error.fields).toEqual({ name: "Contains a character that cannot be stored (U+0000)." });
    const doc = { ...sampleDoc(), room: { walls: sampleDoc().room.walls.map((w, i) => (i === 2 ? { ...w, id: "so\u0000uth" } : w)) } };
    const put = await send(`/api/v1/plans/${planId}`, { method: "PUT", cookie, headers: { "content-type": "application/json" }, body: JSON.stringify({ document: doc, version: 1 }) });
    expectEnvelope(put, 422);
    expect(put.body.error.fields["document.room.walls.2.id"]).toMatch(/U\+0000/);
    expect((await alice.get(`/api/v1/plans/${planId}`)).body.plan.version).toBe(1);
  });

  it("refuses a lone surrogate with its field path instead of storing U+FFFD", async () => {
    const name = `Lone half ${Math.random().toString(36).slice(2, 8)} `;
    const raw = `{"name":${JSON.stringify(name).slice(0, -1)}\\ud800"}`;
    const r = await send("/api/v1/plans", { method: "POST", cookie, headers: { "content-type": "application/json" }, body: raw });
    expectEnvelope(r, 422, "invalid");
    expect(r.body.error.fields.name).toBe("Contains a character that cannot be stored (a lone U+D800).");
    const keyed = await send("/api/v1/plans", { method: "POST", cookie, headers: { "content-type": "application/json" }, body: '{"name":"ok","\\udc00":1}' });
    expectEnvelope(keyed, 422);
    expect(Object.keys(keyed.body.error.fields)).toEqual(["\\uDC00"]);
    const plans = (await alice.get("/api/v1/plans")).body.plans as { name: string }[];
    expect(plans.some((p) => p.name.startsWith(name.trim()))).toBe(false);
    // Bytes that are not UTF-8 are refused too, not replaced.
    const bytes = new Uint8Array([...Buffer.from('{"name":"'), 0xed, 0xa0, 0x80, ...Buffer.from('"}')]);
    expectEnvelope(await send("/api/v1/plans", { method: "POST", cookie, headers: { "content-type": "application/json" }, body: bytes }), 422, "invalid_encoding");
  });

  it("answers a 3000-deep body with 422 and no internal text", async () => {
    const deep = "[".repeat(3000) + "]".repeat(3000);
    const deepObj = '{"a":'.repeat(3000) + "1" + "}".repeat(3000);
    for (const [path, method, body] of [
      ["/api/v1/analyze", "POST", deep],
      ["/api/v1/analyze", "POST", `{"plan":${deepObj}}`],
      ["/api/v1/plans", "POST", `{"name":"Deep","document":${deepObj}}`],
      [`/api/v1/plans/${planId}`, "PUT", `{"version":1,"document":${deep}}`],
    ] as const) {
      const r = await send(path, { method, cookie, headers: { "content-type": "application/json" }, body });
      expectEnvelope(r, 422, "too_deep");
      expect(r.body.error.message).toBe("The body nests deeper than 64 levels.");
    }
  });

  it("answers a 50 MB chunked body with 413 while the client is still sending (never read whole)", async () => {
    const url = new URL(BASE_URL);
    const chunk = Buffer.alloc(1 << 20, 0x20);
    const total = 50;
    const result = await new Promise<{ status: number; body: string; sentMiB: number }>((resolve, reject) => {
      let sent = 0;
      let answered = false;
      const req = http.request({ host: url.hostname, port: url.port, method: "POST", path: "/api/v1/analyze", headers: { "content-type": "application/json", "transfer-encoding": "chunked" } }, (res) => {
        answered = true;
        const sentMiB = sent;
        let body = "";
        res.on("data", (d) => (body += d));
        res.on("end", () => {
          req.destroy();
          resolve({ status: res.statusCode ?? 0, body, sentMiB });
        });
      });
      req.on("error", (e) => (answered ? undefined : reject(e)));
      const pump = () => {
        // Write with back-pressure: a server that held the whole body would answer only after all 50 MiB.
        while (!answered && sent < total) {
          sent++;
          if (!req.write(chunk)) return void req.once("drain", pump);
        }
        if (!answered) req.end();
      };
      req.write("[");
      pump();
    });
    expect(result.status).toBe(413);
    expect(JSON.parse(result.body).error.code).toBe("too_large");
    expect(result.sentMiB).toBeLessThan(total / 2);
  });

  it("answers a declared oversized body with 413 before reading it", async () => {
    const big = JSON.stringify({ name: "x".repeat(1_100_000) });
    expectEnvelope(await send("/api/v1/plans", { method: "POST", cookie, headers: { "content-type": "application/json" }, body: big }), 413, "too_large");
  });

  it("refuses text/plain and form bodies on JSON routes with 415", async () => {
    for (const type of ["text/plain", "text/plain;charset=UTF-8", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x"]) {
      const r = await send("/api/v1/plans", { method: "POST", cookie, headers: { "content-type": type }, body: JSON.stringify({ name: "Sneaky" }) });
      expectEnvelope(r, 415, "unsupported_media_type");
    }
    const noType = await send("/api/v1/plans", { method: "POST", cookie, body: new Blob([JSON.stringify({ name: "Untyped" })]) });
    expectEnvelope(noType, 415);
    // application/json with a charset, and +json types, are JSON.
    expect((await send("/api/v1/plans", { method: "POST", cookie, headers: { "content-type": "application/json; charset=utf-8" }, body: JSON.stringify({ name: "Typed" }) })).status).toBe(201);
    // A body-less POST needs no type.
    expect((await send(`/api/v1/plans/${planId}/duplicate`, { method: "POST", cookie })).status).toBe(201);
  });

  it("refuses a write sent from another site's page (403) and allows the app's own origin and no origin", async () => {
    const body = JSON.stringify({ name: "Cross-site" });
    const json = { "content-type": "application/json" };
    for (const origin of ["https://evil.example", "null", `${new URL(BASE_URL).protocol}//127.0.0.2:${new URL(BASE_URL).port}`]) {
      const r = await send("/api/v1/plans", { method: "POST", cookie, headers: { ...json, origin }, body });
      expectEnvelope(r, 403, "foreign_origin");
      expectEnvelope(await send(`/api/v1/plans/${planId}`, { method: "DELETE", cookie, headers: { origin } }), 403, "foreign_origin");
    }
    expect((await send("/api/v1/plans", { method: "POST", cookie, headers: { ...json, origin: new URL(BASE_URL).origin }, body })).status).toBe(201);
    expect((await send("/api/v1/plans", { method: "POST", cookie, headers: json, body })).status).toBe(201);
    // Reads are not state-changing: a foreign Origin on GET is not refused by this check.
    expect((await send(`/api/v1/plans/${planId}`, { cookie, headers: { origin: "https://evil.example" } })).status).toBe(200);
    // next-auth's own routes keep their CSRF token check.
    expect((await send("/api/auth/csrf", { headers: { origin: "https://evil.example" } })).status).toBe(200);
  });

  it("puts a request id in every error answer; a well-formed incoming id is kept, a malformed one replaced", async () => {
    const anon = await send("/api/v1/plans");
    expectEnvelope(anon, 401, "unauthorized");
    const kept = await send("/api/v1/plans", { headers: { "x-request-id": "trace-0042-abcd" } });
    expect(kept.body.error.requestId).toBe("trace-0042-abcd");
    const replaced = await send("/api/v1/plans", { headers: { "x-request-id": "bad id\twith\"quotes" } });
    expect(replaced.body.error.requestId).not.toContain("bad");
    expect(replaced.headers.get("x-request-id")).toBe(replaced.body.error.requestId);
    // Successful answers carry the header too.
    expect((await send("/api/v1/schema/plan")).headers.get("x-request-id")).toMatch(/^[0-9a-f-]{36}$/);
  });
});
