import type { z } from "zod";
import type { Finding } from "@/lib/engine/checks/types";
import type { Derived } from "@/lib/engine/derive-types";
import type { Footprint, Part } from "@/lib/engine/fixtures/types";
import type { PlanDocument, PlanSettings } from "@/lib/engine/plan/schema";

/** Result of reading a typed length: millimetres, or a message saying what is wrong. */
export type LengthRead = { ok: true; mm: number } | { ok: false; message: string };

/** A fixture kind as the catalogue lists it. */
export interface KindInfo {
  kind: string;
  title: string;
  blurb: string;
}

export interface ParseOptions {
  allowZero?: boolean;
  allowNegative?: boolean;
}

/**
 * What the editor needs from the engine. The live implementation (engine-live.ts) calls the
 * engine; tests may pass a small stand-in so the store and tools are tested on their own.
 */
export interface EnginePort {
  derive(doc: PlanDocument, previous?: { doc: PlanDocument; derived: Derived }): Derived;
  evaluate(doc: PlanDocument, derived: Derived): Finding[];
  kinds(): readonly KindInfo[];
  /** The kind's parameters schema (the properties panel is generated from it). */
  paramsSchema(kind: string): z.ZodType | undefined;
  defaultParams(kind: string): Record<string, unknown>;
  footprint(kind: string, params: Record<string, unknown>, doc: PlanDocument): Footprint;
  /** One fixture's parts list (for the read-only sizes in the properties panel). */
  fixtureParts(doc: PlanDocument, fixtureId: string): Part[];
  formatLength(mm: number, settings: PlanSettings): string;
  parseLength(text: string, settings: PlanSettings, opts?: ParseOptions): LengthRead;
}
