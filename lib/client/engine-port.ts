import type { z } from "zod";
import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import type { Finding } from "@/lib/engine/checks/types";
import type { Derived } from "@/lib/engine/derive-types";
import type { Footprint } from "@/lib/engine/fixtures/types";
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

/** An instructor's rule preset the plan has adopted: its numbers win over the defaults, and findings name it. */
export interface AdoptedPreset {
  id: string;
  name: string;
  numbers: Partial<RuleNumbers>;
}

export interface AnalyserOptions {
  /** The preset in force now (read on every analysis; a different object starts the checks over). */
  preset?: () => AdoptedPreset | null;
}

/**
 * What the editor needs from the engine. The live implementation (engine-live.ts) calls the
 * engine; tests may pass a small stand-in so the store and tools are tested on their own.
 */
export interface EnginePort {
  /** A derive-and-check function for one editor; it may keep state to work incrementally between calls. */
  createAnalyser(opts?: AnalyserOptions): (doc: PlanDocument) => { derived: Derived; findings: Finding[] };
  kinds(): readonly KindInfo[];
  /** The kind's parameters schema (the properties panel is generated from it). */
  paramsSchema(kind: string): z.ZodType | undefined;
  defaultParams(kind: string): Record<string, unknown>;
  footprint(kind: string, params: Record<string, unknown>, doc: PlanDocument): Footprint;
  formatLength(mm: number, settings: PlanSettings): string;
  parseLength(text: string, settings: PlanSettings, opts?: ParseOptions): LengthRead;
}
