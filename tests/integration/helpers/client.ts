/**
 * A small HTTP client for integration tests against the running app (started by scripts/test.sh,
 * which exports BW_BASE_URL). It keeps cookies like a browser so next-auth sessions work.
 */
import { randomUUID } from "node:crypto";

export const BASE_URL = process.env.BW_BASE_URL ?? "";
export const hasServer = BASE_URL !== "";
export const DEMO_PASSWORD = "sawdust-and-pine-42";
export const DEMO = {
  member: "robin@demo.benchwright.test",
  instructor: "ines@demo.benchwright.test",
  admin: "avery@demo.benchwright.test",
};

export interface Res<T = any> {
  status: number;
  body: T;
  headers: Headers;
}

export class Client {
  private cookies = new Map<string, string>();

  private absorb(res: Response) {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const eq = pair.indexOf("=");
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      if (value === "" || /max-age=0/i.test(c)) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  async raw(path: string, init: RequestInit = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set("cookie", this.cookieHeader());
    const res = await fetch(BASE_URL + path, { ...init, headers, redirect: "manual" });
    this.absorb(res);
    return res;
  }

  async req<T = any>(method: string, path: string, body?: unknown): Promise<Res<T>> {
    const init: RequestInit = { method };
    if (body !== undefined) {
      init.body = typeof body === "string" ? body : JSON.stringify(body);
      init.headers = { "content-type": "application/json" };
    }
    const res = await this.raw(path, init);
    const text = await res.text();
    let parsed: unknown = text;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      /* not JSON: keep the text */
    }
    return { status: res.status, body: parsed as T, headers: res.headers };
  }

  get = <T = any>(p: string) => this.req<T>("GET", p);
  post = <T = any>(p: string, b?: unknown) => this.req<T>("POST", p, b ?? {});
  put = <T = any>(p: string, b?: unknown) => this.req<T>("PUT", p, b);
  patch = <T = any>(p: string, b?: unknown) => this.req<T>("PATCH", p, b);
  del = <T = any>(p: string) => this.req<T>("DELETE", p);

  /** Signs in through next-auth's credentials flow; returns true when a session cookie was set. */
  async signIn(email: string, password: string): Promise<boolean> {
    const csrf = await this.get<{ csrfToken: string }>("/api/auth/csrf");
    const form = new URLSearchParams({ csrfToken: csrf.body.csrfToken, email, password, json: "true" });
    await this.raw("/api/auth/callback/credentials", { method: "POST", body: form, headers: { "content-type": "application/x-www-form-urlencoded" } });
    const s = await this.get<{ user?: { id: string } }>("/api/auth/session");
    return !!s.body?.user?.id;
  }
}

/** A fresh account, signed in. */
export async function newMember(prefix = "maker"): Promise<{ client: Client; email: string; password: string }> {
  const client = new Client();
  const email = `${prefix}-${randomUUID().slice(0, 8)}@example.test`;
  const password = "Oak-and-ash-2026!";
  const r = await client.post("/api/v1/account", { name: `Test ${prefix}`, email, password });
  if (r.status !== 201) throw new Error(`sign-up failed: ${r.status} ${JSON.stringify(r.body)}`);
  if (!(await client.signIn(email, password))) throw new Error("sign-in failed after sign-up");
  return { client, email, password };
}

/** A demo account, signed in. */
export async function demo(who: keyof typeof DEMO): Promise<Client> {
  const c = new Client();
  if (!(await c.signIn(DEMO[who], DEMO_PASSWORD))) throw new Error(`demo sign-in failed for ${who}`);
  return c;
}
