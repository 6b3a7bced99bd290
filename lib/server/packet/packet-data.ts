/**
 * The build packet's content, worked out by the engine from the plan document: drawings, checks,
 * merged parts, sheet maps, board plan, shopping list and cautions. Pure (runs in a worker thread);
 * the PDF pages in components/packet/ lay this out and compute nothing.
 */
import { planBoards } from "@/lib/engine/boards/plan-boards";
import { buildPlan } from "@/lib/engine/build";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import { RULES } from "@/lib/engine/checks/registry";
import type { Finding } from "@/lib/engine/checks/types";
import { derivePlan } from "@/lib/engine/derive";
import type { Derived } from "@/lib/engine/derive-types";
import { planDrawings } from "@/lib/engine/drawings/plan-drawings";
import { getFixtureKind } from "@/lib/engine/fixtures/registry";
import { nestSheets } from "@/lib/engine/nesting/nest-sheets";
import { planNestOptions } from "@/lib/engine/nesting/plan-nest";
import { planPartsList } from "@/lib/engine/parts";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { buildShoppingList } from "@/lib/engine/shopping/shopping-list";
import { formatLength } from "@/lib/engine/units/format-length";
import { packetCautions } from "./cautions";
import { paperFor } from "./paper";
import { qrPath } from "./qr";
import type { PacketCheck, PacketData, PacketFinding, PacketInput } from "./types";

/** Open findings printed per rule; the rest are counted (a plan with hundreds of fixtures would fill pages with one rule). */
const OPEN_PER_RULE = 40;

function lengthText(doc: PlanDocument) {
  return (mm: number) => formatLength(mm, { units: doc.settings.units, precision: doc.settings.precision });
}

function valueText(v: number | undefined, unit: Finding["unit"], len: (mm: number) => string): string | undefined {
  if (v === undefined || !Number.isFinite(v)) return undefined;
  switch (unit) {
    case "mm":
      return len(v);
    case "deg":
      return `${Math.round(v * 10) / 10}°`;
    case "%":
      return `${Math.round(v * 10) / 10}%`;
    case "kg":
      return `${Math.round(v * 10) / 10} kg`;
    case "mm/m":
      return `${Math.round(v * 100) / 100} mm per m`;
    default:
      return String(Math.round(v * 100) / 100);
  }
}

function packetFinding(f: Finding, len: (mm: number) => string): PacketFinding {
  return { severity: f.severity, pass: f.pass, message: f.message, measured: valueText(f.measured, f.unit, len), required: valueText(f.required, f.unit, len) };
}

/** Every rule with its open findings (most serious first) and its passes counted. */
function checksOf(findings: readonly Finding[], len: (mm: number) => string): PacketCheck[] {
  const byRule = new Map<string, Finding[]>();
  for (const f of findings) {
    const list = byRule.get(f.ruleId);
    if (list) list.push(f);
    else byRule.set(f.ruleId, [f]);
  }
  return RULES.map((r) => {
    const list = byRule.get(r.id) ?? [];
    const open = list.filter((f) => !f.pass);
    return {
      ruleId: r.id,
      title: r.title,
      severity: r.severity,
      formula: r.formula,
      numbers: r.numbers,
      sources: r.sources.map((s) => ({ citation: s.citation, status: s.status })),
      open: open.slice(0, OPEN_PER_RULE).map((f) => packetFinding(f, len)),
      passes: list.length - open.length,
      moreOpen: Math.max(0, open.length - OPEN_PER_RULE),
    };
  });
}

function fixtureNames(doc: PlanDocument): Map<string, string> {
  return new Map(doc.fixtures.map((f) => [f.id, f.label || getFixtureKind(f.kind)?.title || f.kind]));
}

/** The packet's content for a plan; deterministic for the same input (nesting has a seed and a work cap). */
export function buildPacketData(input: PacketInput): PacketData {
  const { doc } = input;
  const len = lengthText(doc);
  let derived: Derived | null = null;
  let problem: string | null = null;
  try {
    derived = derivePlan(doc);
  } catch {
    problem = "The room cannot be solved from its measurements, so this packet has no drawings or checks. Check the wall lengths and angles in the editor.";
  }
  const findings = derived ? evaluatePlan(doc, derived, input.preset ? { preset: input.preset.numbers, presetLabel: input.preset.name } : {}) : [];
  const parts = derived?.parts ?? [];
  const hardware = derived?.hardware ?? [];
  const names = fixtureNames(doc);
  const list = planPartsList({ parts, hardware });
  const build = buildPlan(doc, { parts, fixtures: derived?.fixtures });
  const nest = nestSheets(parts, doc.materials, planNestOptions(doc.settings.kerfMm));
  const boards = planBoards(parts, doc.materials, { kerfMm: doc.settings.kerfMm });
  const shopping = buildShoppingList({ parts, hardware, sheets: nest.materials, boards, materials: doc.materials }, input.prices, {});
  const open = findings.filter((f) => !f.pass);
  const count = (s: Finding["severity"]) => open.filter((f) => f.severity === s).length;
  return {
    meta: {
      name: input.name,
      ownerName: input.ownerName,
      revision: input.revision,
      changed: new Date(input.updatedAt).toLocaleDateString("en-US", { dateStyle: "medium", timeZone: "UTC" }),
      units: doc.settings.units,
      precision: doc.settings.precision,
      paper: paperFor(doc.settings),
      shopUrl: input.shopUrl,
      shared: input.shared,
      presetName: input.preset?.name ?? null,
      fixtureCount: doc.fixtures.length,
    },
    qr: qrPath(input.shopUrl),
    drawings: derived ? planDrawings(doc, derived) : null,
    problem,
    summary: {
      conflicts: count("conflict"),
      cautions: count("caution"),
      advice: count("advice"),
      passes: findings.length - open.length,
      top: open.filter((f) => f.severity !== "advice").slice(0, 8).map((f) => packetFinding(f, len)),
    },
    checks: checksOf(findings, len),
    parts: build.rows.map((r) => ({
      label: r.label,
      name: r.name,
      qty: r.qty,
      pieces: r.pieces,
      length: len(r.lengthMm),
      width: len(r.widthMm),
      thickness: len(r.thicknessMm),
      material: r.materialName,
      grain: r.grain,
      notes: [...r.edges.map((e) => `edge: ${e}`), ...r.joinery].join("; "),
      fixtures: r.fixtures.map((f) => `${f.letter} ${names.get(f.fixtureId) ?? f.fixtureId}${f.qty > 1 ? ` x${f.qty}` : ""}`).join(", "),
    })),
    build,
    partLabels: build.labelOf,
    hardware: list.hardware.map((h) => ({ name: h.name, qty: h.unit === "mm" ? len(h.qty) : h.unit === "each" ? String(h.qty) : `${Math.round(h.qty * 100) / 100} ${h.unit}` })),
    sheets: nest.materials,
    boards,
    shopping,
    cautions: packetCautions(findings),
    kerfMm: doc.settings.kerfMm,
  };
}
