import { openDB, type DBSchema, type IDBPDatabase } from "idb";

/**
 * The shop view's data on the phone (IndexedDB through `idb`): the last build and progress it read
 * for each plan or link, and the check-offs made there. For a plan, a check-off waits in the queue
 * until the server has it; for a share link (read-only) check-offs stay on the phone for good.
 */
export type ShopSource = { kind: "plan"; planId: string } | { kind: "share"; token: string };

export const sourceKey = (s: ShopSource) => (s.kind === "plan" ? `plan:${s.planId}` : `share:${s.token}`);

export interface LocalCheck {
  id: string;
  source: string;
  item: string;
  delta: 1 | -1;
  madeAt: string;
  /** True for a share link's check-offs, which are never sent. */
  localOnly: boolean;
}

export interface Snapshot<B, P> {
  source: string;
  build: B;
  progress: P | null;
  savedAt: string;
}

interface ShopDb<B, P> extends DBSchema {
  checks: { key: string; value: LocalCheck; indexes: { bySource: string } };
  snapshots: { key: string; value: Snapshot<B, P> };
}

let opened: Promise<IDBPDatabase<ShopDb<unknown, unknown>>> | null = null;

function db<B, P>(): Promise<IDBPDatabase<ShopDb<B, P>>> {
  opened ??= openDB<ShopDb<unknown, unknown>>("benchwright-shop", 1, {
    upgrade(d) {
      d.createObjectStore("checks", { keyPath: "id" }).createIndex("bySource", "source");
      d.createObjectStore("snapshots", { keyPath: "source" });
    },
  });
  return opened as unknown as Promise<IDBPDatabase<ShopDb<B, P>>>;
}

export async function readSnapshot<B, P>(source: string): Promise<Snapshot<B, P> | undefined> {
  return (await db<B, P>()).get("snapshots", source);
}

export async function writeSnapshot<B, P>(snap: Snapshot<B, P>): Promise<void> {
  await (await db<B, P>()).put("snapshots", snap);
}

export async function checksOf(source: string): Promise<LocalCheck[]> {
  const all = await (await db()).getAllFromIndex("checks", "bySource", source);
  return all.sort((a, b) => a.madeAt.localeCompare(b.madeAt));
}

export async function addCheck(c: LocalCheck): Promise<void> {
  await (await db()).put("checks", c);
}

/** Forgets check-offs the server has confirmed. */
export async function dropChecks(ids: readonly string[]): Promise<void> {
  const tx = (await db()).transaction("checks", "readwrite");
  await Promise.all([...ids.map((id) => tx.store.delete(id)), tx.done]);
}

/** A random UUID, also where crypto.randomUUID is missing (a page served over plain http on the shop's network). */
export function newId(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6]! & 0x0f) | 0x40;
  b[8] = (b[8]! & 0x3f) | 0x80;
  const h = [...b].map((x) => x.toString(16).padStart(2, "0")).join("");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}
