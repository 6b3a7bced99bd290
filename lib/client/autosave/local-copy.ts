import type { PlanDocument } from "@/lib/engine/plan/schema";

/** A document kept on this device because the server could not take it. */
export interface LocalCopy {
  planId: string;
  doc: PlanDocument;
  /** The server version the edits started from. */
  baseVersion: number;
  savedAt: number;
}

export interface LocalCopyStore {
  get(planId: string): Promise<LocalCopy | undefined>;
  set(copy: LocalCopy): Promise<void>;
  del(planId: string): Promise<void>;
}

const key = (planId: string) => `benchwright:unsaved:${planId}`;

/** IndexedDB through idb-keyval; loaded lazily so server rendering never touches it. */
export function idbLocalCopies(): LocalCopyStore {
  const lib = () => import("idb-keyval");
  return {
    get: async (id) => (await lib()).get<LocalCopy>(key(id)),
    set: async (c) => (await lib()).set(key(c.planId), c),
    del: async (id) => (await lib()).del(key(id)),
  };
}

/** In memory, for tests and for browsers without IndexedDB. */
export function memoryLocalCopies(): LocalCopyStore & { map: Map<string, LocalCopy> } {
  const map = new Map<string, LocalCopy>();
  return {
    map,
    get: async (id) => map.get(key(id)),
    set: async (c) => void map.set(key(c.planId), c),
    del: async (id) => void map.delete(key(id)),
  };
}
