import type { BoardPlan } from "@/lib/engine/boards/types";
import type { BuildResult } from "@/lib/engine/build";
import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import type { Severity } from "@/lib/engine/checks/types";
import type { PlanDrawings } from "@/lib/engine/drawings/plan-drawings";
import type { MaterialNest } from "@/lib/engine/nesting/types";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { ShoppingList } from "@/lib/engine/shopping/types";
import type { PriceItem } from "@/lib/engine/shopping/price-schema";

/** Paper the packet is printed on. */
export type PaperSize = "LETTER" | "A4";

/** What the server knows about the plan beyond its document, for the packet (plain data: it crosses to a worker thread). */
export interface PacketInput {
  doc: PlanDocument;
  name: string;
  ownerName: string;
  /** The plan's saved version: the packet's revision. */
  revision: number;
  /** When the plan was last changed, ISO 8601. */
  updatedAt: string;
  /** Where the QR code on the cover leads: the phone shop view of the plan or of the share link. */
  shopUrl: string;
  /** Read through a share link (said on the cover). */
  shared: boolean;
  preset: { name: string; numbers: Partial<RuleNumbers> } | null;
  prices: PriceItem[];
}

/** One finding as the packet prints it: numbers already in the plan's units. */
export interface PacketFinding {
  severity: Severity;
  pass: boolean;
  message: string;
  measured?: string;
  required?: string;
}

/** A rule with what it found in this plan, its numbers and where they come from. */
export interface PacketCheck {
  ruleId: string;
  title: string;
  severity: Severity;
  formula: string;
  numbers: { label: string; value: string }[];
  sources: { citation: string; status: string }[];
  open: PacketFinding[];
  passes: number;
  /** Open findings past the page's cap, counted. */
  moreOpen: number;
}

/** One line of the merged parts list, sizes written in the plan's units. */
export interface PacketPartLine {
  label: string;
  name: string;
  qty: number;
  /** Pieces to saw when a part is glued up from layers (else qty). */
  pieces: number;
  length: string;
  width: string;
  thickness: string;
  material: string;
  grain: string;
  notes: string;
  fixtures: string;
}

export interface PacketCaution {
  title: string;
  text: string;
  source: string;
}

/** Everything the packet's pages print, worked out by the engine; the pages only lay it out. */
export interface PacketData {
  meta: {
    name: string;
    ownerName: string;
    revision: number;
    /** The plan's last change, in words ("Dec 2, 2026"). */
    changed: string;
    units: PlanDocument["settings"]["units"];
    precision: PlanDocument["settings"]["precision"];
    paper: PaperSize;
    shopUrl: string;
    shared: boolean;
    presetName: string | null;
    fixtureCount: number;
  };
  /** The QR code of shopUrl: a square of `size` modules and one path of its dark modules. */
  qr: { size: number; path: string };
  drawings: PlanDrawings | null;
  /** Why there are no drawings or checks (the room cannot be solved), else null. */
  problem: string | null;
  summary: { conflicts: number; cautions: number; advice: number; passes: number; top: PacketFinding[] };
  checks: PacketCheck[];
  parts: PacketPartLine[];
  /** The day at the saw: labelled cut list, setups in run order, stop tables and build steps (lib/engine/build). */
  build: BuildResult;
  /** The label of each part id (its cut-list row), for the sheet maps and board plan. */
  partLabels: Record<string, string>;
  hardware: { name: string; qty: string }[];
  sheets: MaterialNest[];
  boards: BoardPlan;
  shopping: ShoppingList;
  cautions: PacketCaution[];
  /** Saw kerf the sheet maps and board plan allow for, mm. */
  kerfMm: number;
}
