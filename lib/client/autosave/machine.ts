/**
 * The save status as a small state machine. Pure: the controller feeds it events and acts on the
 * state it lands in.
 *   saved --edit--> dirty --start--> saving --ok--> saved
 *   saving --stale--> conflict (until the user loads the newer plan or keeps theirs as a copy)
 *   saving --network/server error--> offline (the document waits on this device; retried)
 */
export type SaveStatus =
  | { kind: "saved"; at: number | null }
  | { kind: "dirty" }
  | { kind: "saving"; editedDuring: boolean; /** Failed tries before this one. */ attempts: number }
  | { kind: "offline"; attempts: number; reason: "network" | "server"; message: string }
  | { kind: "conflict"; serverVersion: number | null; message: string };

export type SaveEvent =
  | { type: "edit" }
  | { type: "start" }
  | { type: "ok"; at: number }
  | { type: "stale"; serverVersion: number | null; message: string }
  | { type: "failed"; reason: "network" | "server"; message: string }
  | { type: "resolved"; at: number };

export function nextStatus(s: SaveStatus, e: SaveEvent): SaveStatus {
  switch (e.type) {
    case "edit":
      if (s.kind === "saving") return { ...s, editedDuring: true };
      if (s.kind === "conflict" || s.kind === "offline") return s;
      return { kind: "dirty" };
    case "start":
      if (s.kind === "conflict") return s;
      return { kind: "saving", editedDuring: false, attempts: s.kind === "offline" ? s.attempts : 0 };
    case "ok":
      // An edit made while the request was out still needs saving.
      return s.kind === "saving" && s.editedDuring ? { kind: "dirty" } : { kind: "saved", at: e.at };
    case "stale":
      return { kind: "conflict", serverVersion: e.serverVersion, message: e.message };
    case "failed":
      return { kind: "offline", attempts: s.kind === "offline" || s.kind === "saving" ? s.attempts + 1 : 1, reason: e.reason, message: e.message };
    case "resolved":
      return { kind: "saved", at: e.at };
  }
}

/** Whether changes exist that the server does not have. */
export const hasUnsaved = (s: SaveStatus) => s.kind !== "saved";

/** Wait before retry n (1-based), ms: 2 s doubling to at most a minute. */
export const retryDelayMs = (attempt: number) => Math.min(60_000, 2000 * 2 ** Math.max(0, attempt - 1));
