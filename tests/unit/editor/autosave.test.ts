import { afterEach, beforeEach, describe, it, expect, vi } from "vitest";
import { Autosave } from "@/lib/client/autosave/autosave";
import { memoryLocalCopies } from "@/lib/client/autosave/local-copy";
import { nextStatus, retryDelayMs } from "@/lib/client/autosave/machine";
import { plansApi } from "@/lib/client/autosave/plans-api";
import { setWallLength } from "@/lib/client/store/room-ops";
import { fakeServer } from "./fake-server";
import { roomDoc } from "./harness";

function setup() {
  const start = roomDoc();
  const server = fakeServer(start);
  const copies = memoryLocalCopies();
  let doc = start;
  const saver = new Autosave({ planId: "p1", version: 1, savedDoc: start, api: plansApi(server.fetch), copies, getDoc: () => doc, debounceMs: 500, now: () => 1000 });
  const edit = (mm: number) => {
    doc = setWallLength(doc, "w1", mm);
    saver.notifyEdit();
  };
  return { server, copies, saver, edit, getDoc: () => doc };
}

describe("save status machine", () => {
  it("goes saved -> dirty -> saving -> saved, and back to dirty if edited while saving", () => {
    let s = nextStatus({ kind: "saved", at: null }, { type: "edit" });
    expect(s.kind).toBe("dirty");
    s = nextStatus(s, { type: "start" });
    s = nextStatus(s, { type: "edit" });
    expect(nextStatus(s, { type: "ok", at: 1 }).kind).toBe("dirty");
    expect(nextStatus({ kind: "saving", editedDuring: false, attempts: 0 }, { type: "ok", at: 1 })).toEqual({ kind: "saved", at: 1 });
  });

  it("counts offline attempts and stays in conflict until resolved", () => {
    let s = nextStatus({ kind: "saving", editedDuring: false, attempts: 0 }, { type: "failed", reason: "network", message: "x" });
    s = nextStatus(nextStatus(s, { type: "start" }), { type: "failed", reason: "network", message: "x" });
    expect(s).toMatchObject({ kind: "offline", attempts: 2 });
    const c = nextStatus(s, { type: "stale", serverVersion: 4, message: "m" });
    expect(nextStatus(c, { type: "edit" })).toBe(c);
    expect(nextStatus(c, { type: "start" })).toBe(c);
    expect(nextStatus(c, { type: "resolved", at: 5 })).toEqual({ kind: "saved", at: 5 });
  });

  it("backs off from 2 s to at most a minute", () => {
    expect([1, 2, 3, 10].map(retryDelayMs)).toEqual([2000, 4000, 8000, 60000]);
  });
});

describe("autosave", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it("saves once after edits settle, with the loaded version, and takes the new one", async () => {
    const t = setup();
    t.edit(4100);
    t.edit(4200);
    expect(t.saver.status.kind).toBe("dirty");
    await vi.advanceTimersByTimeAsync(499);
    expect(t.server.s.calls).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(10);
    expect(t.server.s.calls).toHaveLength(1);
    expect(t.server.s.calls[0]).toMatchObject({ method: "PUT", url: "/api/v1/plans/p1", body: { version: 1 } });
    expect(t.saver.status).toEqual({ kind: "saved", at: 1000 });
    expect(t.saver.store.getState().version).toBe(2);
    expect(t.server.s.plans.get("p1")!.document.room.walls[0].lengthMm).toBe(4200);
  });

  it("on 409 goes to conflict, keeps the work on the device, and can load the newer plan", async () => {
    const t = setup();
    t.server.bump();
    t.edit(4100);
    await t.saver.flush();
    expect(t.saver.status).toMatchObject({ kind: "conflict", serverVersion: 2 });
    expect(t.copies.map.size).toBe(1);
    // Edits in conflict do not try to save.
    t.edit(4300);
    await vi.advanceTimersByTimeAsync(1000);
    expect(t.server.s.calls.filter((c) => c.method === "PUT")).toHaveLength(1);
    const newer = await t.saver.loadNewer();
    expect(newer.version).toBe(2);
    expect(t.saver.status.kind).toBe("saved");
    expect(t.saver.store.getState().version).toBe(2);
    expect(t.copies.map.size).toBe(0);
  });

  it("on 409 can keep mine as a copy (a new plan with my document)", async () => {
    const t = setup();
    t.server.bump();
    t.edit(4100);
    await t.saver.flush();
    const copy = await t.saver.keepMineAsCopy("Shop (my copy)");
    expect(copy.id).toBe("copy1");
    expect(t.server.s.plans.get("copy1")!.document.room.walls[0].lengthMm).toBe(4100);
    expect(t.server.s.plans.get("copy1")!.name).toBe("Shop (my copy)");
  });

  it("offline: keeps the document in local storage, retries with back-off, and clears it once saved", async () => {
    const t = setup();
    t.server.s.mode = "down";
    t.edit(4100);
    await vi.advanceTimersByTimeAsync(500);
    expect(t.saver.status).toMatchObject({ kind: "offline", attempts: 1, reason: "network" });
    expect([...t.copies.map.values()][0].doc.room.walls[0].lengthMm).toBe(4100);
    await vi.advanceTimersByTimeAsync(2000);
    expect(t.saver.status).toMatchObject({ kind: "offline", attempts: 2 });
    t.server.s.mode = "up";
    await vi.advanceTimersByTimeAsync(4000);
    expect(t.saver.status.kind).toBe("saved");
    expect(t.copies.map.size).toBe(0);
    expect(t.server.s.plans.get("p1")!.version).toBe(2);
  });

  it("treats a server error like offline", async () => {
    const t = setup();
    t.server.s.mode = "error";
    t.edit(4100);
    await t.saver.flush();
    expect(t.saver.status).toMatchObject({ kind: "offline", reason: "server" });
    expect(t.copies.map.size).toBe(1);
  });

  it("on reopening offers the unsaved copy, and restoring hands back its document", async () => {
    const t = setup();
    t.server.s.mode = "down";
    t.edit(4150);
    await t.saver.flush();
    t.saver.dispose();
    // A fresh editor on the same device, loading the server's (older) plan.
    const again = new Autosave({ planId: "p1", version: 1, savedDoc: roomDoc(), api: plansApi(t.server.fetch), copies: t.copies, getDoc: roomDoc });
    const offer = await again.checkRestore();
    expect(offer?.doc.room.walls[0].lengthMm).toBe(4150);
    const doc = await again.settleRestore(true);
    expect(doc?.room.walls[0].lengthMm).toBe(4150);
    expect(again.store.getState().pendingRestore).toBeNull();
  });

  it("does not offer a copy equal to the server's plan, and forgets a declined one", async () => {
    const t = setup();
    await t.copies.set({ planId: "p1", doc: roomDoc(), baseVersion: 1, savedAt: 1 });
    expect(await t.saver.checkRestore()).toBeNull();
    expect(t.copies.map.size).toBe(0);
    await t.copies.set({ planId: "p1", doc: setWallLength(roomDoc(), "w1", 10), baseVersion: 1, savedAt: 1 });
    expect(await t.saver.checkRestore()).not.toBeNull();
    expect(await t.saver.settleRestore(false)).toBeNull();
    expect(t.copies.map.size).toBe(0);
  });

  it("waits for a drag to end before saving", async () => {
    const start = roomDoc();
    const server = fakeServer(start);
    let busy = true;
    let doc = start;
    const saver = new Autosave({ planId: "p1", version: 1, savedDoc: start, api: plansApi(server.fetch), copies: memoryLocalCopies(), getDoc: () => doc, busy: () => busy, debounceMs: 100 });
    doc = setWallLength(doc, "w1", 4100);
    saver.notifyEdit();
    await vi.advanceTimersByTimeAsync(250);
    expect(server.s.calls).toHaveLength(0);
    busy = false;
    await vi.advanceTimersByTimeAsync(400);
    expect(server.s.calls).toHaveLength(1);
  });
});
