import { createStore } from "zustand/vanilla";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { LocalCopy, LocalCopyStore } from "./local-copy";
import { nextStatus, retryDelayMs, type SaveEvent, type SaveStatus } from "./machine";
import { ApiError, serverVersionOf, type PlanRecord, type PlansApi } from "./plans-api";

export interface AutosaveState {
  status: SaveStatus;
  /** The server version the current document builds on. */
  version: number;
  /** Unsaved work found on this device when the plan was opened, offered for restore. */
  pendingRestore: LocalCopy | null;
}

export interface AutosaveInit {
  planId: string;
  version: number;
  /** The document as loaded from the server. */
  savedDoc: PlanDocument;
  api: PlansApi;
  copies: LocalCopyStore;
  getDoc: () => PlanDocument;
  /** True while a drag is running: saving waits for it to end. */
  busy?: () => boolean;
  debounceMs?: number;
  now?: () => number;
}

/** Saves the document after edits settle; keeps it on the device when the server cannot take it. */
export class Autosave {
  readonly store;
  private savedDoc: PlanDocument;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private inFlight: Promise<void> | null = null;
  private disposed = false;

  constructor(private readonly o: AutosaveInit) {
    this.savedDoc = o.savedDoc;
    this.store = createStore<AutosaveState>()(() => ({ status: { kind: "saved", at: null }, version: o.version, pendingRestore: null }));
  }

  get status(): SaveStatus {
    return this.store.getState().status;
  }

  private send(e: SaveEvent): void {
    this.store.setState({ status: nextStatus(this.status, e) });
  }

  private now(): number {
    return this.o.now?.() ?? Date.now();
  }

  /** Call on every document change. */
  notifyEdit(): void {
    if (this.o.getDoc() === this.savedDoc && this.status.kind === "saved") return;
    this.send({ type: "edit" });
    this.schedule(this.o.debounceMs ?? 800);
  }

  private schedule(ms: number): void {
    if (this.disposed) return;
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.flush();
    }, ms);
  }

  /** Saves now (or joins the save under way). */
  flush(): Promise<void> {
    if (this.inFlight) return this.inFlight;
    this.inFlight = this.doFlush().finally(() => {
      this.inFlight = null;
    });
    return this.inFlight;
  }

  private async doFlush(): Promise<void> {
    if (this.o.busy?.()) return this.schedule(300);
    const doc = this.o.getDoc();
    if (this.status.kind === "conflict") return this.keepLocal(doc);
    if (doc === this.savedDoc) {
      if (this.status.kind !== "saved") this.send({ type: "resolved", at: this.now() });
      return;
    }
    this.send({ type: "start" });
    try {
      const plan = await this.o.api.save(this.o.planId, doc, this.store.getState().version);
      this.savedDoc = doc;
      this.store.setState({ version: plan.version });
      this.send({ type: "ok", at: this.now() });
      await this.o.copies.del(this.o.planId).catch(() => undefined);
      if (this.status.kind === "dirty") this.schedule(this.o.debounceMs ?? 800);
    } catch (e) {
      const err = e instanceof ApiError ? e : new ApiError(0, "network", String(e));
      if (err.status === 409) {
        this.send({ type: "stale", serverVersion: serverVersionOf(err), message: err.message });
      } else {
        this.send({ type: "failed", reason: err.status === 0 ? "network" : "server", message: err.message });
        const s = this.status;
        if (s.kind === "offline") this.schedule(retryDelayMs(s.attempts));
      }
      await this.keepLocal(this.o.getDoc());
    }
  }

  private async keepLocal(doc: PlanDocument): Promise<void> {
    const copy: LocalCopy = { planId: this.o.planId, doc, baseVersion: this.store.getState().version, savedAt: this.now() };
    await this.o.copies.set(copy).catch(() => undefined);
  }

  /** Try again at once (the browser came back online, or the user pressed Retry). */
  retryNow(): Promise<void> {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    return this.flush();
  }

  /** Conflict, first choice: drop local edits and take the server's newer plan. Returns it for the editor to load. */
  async loadNewer(): Promise<PlanRecord> {
    const plan = await this.o.api.get(this.o.planId);
    this.savedDoc = plan.document;
    this.store.setState({ version: plan.version });
    await this.o.copies.del(this.o.planId).catch(() => undefined);
    this.send({ type: "resolved", at: this.now() });
    return plan;
  }

  /** Takes a plan the server now holds (a restored revision) as the saved state. */
  adopt(plan: PlanRecord): void {
    this.savedDoc = plan.document;
    this.store.setState({ version: plan.version });
    this.send({ type: "resolved", at: this.now() });
  }

  /** Conflict, second choice: save my document as a new plan; the caller opens it. */
  async keepMineAsCopy(name: string): Promise<PlanRecord> {
    const plan = await this.o.api.create(name, this.o.getDoc());
    await this.o.copies.del(this.o.planId).catch(() => undefined);
    this.send({ type: "resolved", at: this.now() });
    return plan;
  }

  /** On open: look for work kept on this device that the server does not have. */
  async checkRestore(): Promise<LocalCopy | null> {
    const copy = await this.o.copies.get(this.o.planId).catch(() => undefined);
    const differs = copy && JSON.stringify(copy.doc) !== JSON.stringify(this.savedDoc);
    const pendingRestore = differs ? copy : null;
    if (copy && !differs) await this.o.copies.del(this.o.planId).catch(() => undefined);
    this.store.setState({ pendingRestore });
    return pendingRestore;
  }

  /** Accept or drop the offered local copy. Accepting returns its document for the editor to apply (then it saves). */
  async settleRestore(accept: boolean): Promise<PlanDocument | null> {
    const copy = this.store.getState().pendingRestore;
    this.store.setState({ pendingRestore: null });
    if (!copy) return null;
    if (!accept) await this.o.copies.del(this.o.planId).catch(() => undefined);
    return accept ? copy.doc : null;
  }

  /** (Re)starts scheduling after dispose (React may mount an effect twice in development). */
  start(): void {
    this.disposed = false;
  }

  dispose(): void {
    this.disposed = true;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
  }
}
