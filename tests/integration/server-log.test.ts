/**
 * The running server's log (scripts/test.sh writes it to $BW_DATA_DIR/test-server.log): JSON lines
 * with a request id on each request's lines, and never a password hash or a statement with its values.
 */
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, it, expect } from "vitest";
import { BASE_URL, hasServer, newMember } from "./helpers/client";

const LOG = join(process.env.BW_DATA_DIR ?? ".data", "test-server.log");
const BCRYPT = /\$2[abxy]?\$\d{2}\$[./A-Za-z0-9]{53}/;

describe.skipIf(!hasServer || !existsSync(LOG))("server log", () => {
  it("tags a request's lines with the id its answer carries, and holds no hashes, passwords or SQL values", async () => {
    const { client, password } = await newMember("logged");
    const tagged = `log-check-${Date.now()}`;
    const res = await fetch(`${BASE_URL}/api/v1/plans/00000000-0000-4000-8000-000000000000`, { headers: { cookie: client.cookieHeader(), "x-request-id": tagged } });
    expect(res.status).toBe(404);
    expect(res.headers.get("x-request-id")).toBe(tagged);
    await new Promise((r) => setTimeout(r, 300));

    const text = readFileSync(LOG, "utf8");
    const lines = text.split("\n").filter((l) => l.startsWith("{"));
    const mine = lines.map((l) => JSON.parse(l) as Record<string, unknown>).filter((l) => l.requestId === tagged);
    expect(mine.length).toBeGreaterThan(0);
    expect(mine[0]).toMatchObject({ method: "GET", status: 404 });
    expect(typeof mine[0].time).toBe("number");
    // Every request line of this server process has an id (the file keeps earlier runs' lines too).
    for (const l of lines.map((x) => JSON.parse(x) as Record<string, unknown>)) if (l.pid === mine[0].pid && "status" in l && "path" in l) expect(l.requestId, JSON.stringify(l)).toEqual(expect.any(String));

    expect(text).not.toMatch(BCRYPT);
    expect(text).not.toContain(password);
    expect(text).not.toMatch(/\binsert into\b[^\n]*\bvalues\b/i);
  });
});
