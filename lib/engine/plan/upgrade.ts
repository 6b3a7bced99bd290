import { MM_PER_INCH } from "../units/length";
import { PLAN_SCHEMA_VERSION, planDocumentSchema } from "./schema";
import { upgradeCounter2to3 } from "./upgrade-counter";
import { upgradeSides1to2 } from "./upgrade-sides";
import type { PlanDocument } from "./schema";

/** Why a document could not be brought to the current version. Route handlers map it to 422. */
export class PlanVersionError extends Error {
  readonly code: "not-a-plan" | "newer-version" | "unknown-version" | "bad-old-document";
  readonly version: unknown;
  constructor(code: PlanVersionError["code"], message: string, version?: unknown) {
    super(message);
    this.name = "PlanVersionError";
    this.code = code;
    this.version = version;
  }
}

type Raw = Record<string, unknown>;

/** One step: a document at `from` becomes one at `from + 1`. Steps return new objects. */
export interface UpgradeStep {
  from: number;
  describe: string;
  up(doc: Raw): Raw;
}

const isObject = (v: unknown): v is Raw => typeof v === "object" && v !== null && !Array.isArray(v);
const finite = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);
/** Inches to mm, rounded to 0.0001 mm so stored documents do not carry float noise (264 in is 6705.6, not 6705.599999999999). */
const inToMm = (inches: number): number => Math.round(inches * MM_PER_INCH * 1e4) / 1e4;

/**
 * Version 0: the pre-release shape. Lengths were inches: `room.wallsIn` (numbers, counter-clockwise)
 * and `room.ceilingIn`; `units` at the top; fixtures stood against a wall by `wallIndex` and
 * `offsetIn`. Version 1 keeps every length in mm with ids for walls.
 */
function upgrade0to1(doc: Raw): Raw {
  const room = doc.room;
  if (!isObject(room) || !Array.isArray(room.wallsIn) || !room.wallsIn.every(finite)) {
    throw new PlanVersionError("bad-old-document", "This version 0 plan has no list of wall lengths (room.wallsIn).", 0);
  }
  const walls = room.wallsIn.map((inches, i) => ({ id: `w${i + 1}`, label: "", lengthMm: inToMm(inches) }));
  const fixtures = (Array.isArray(doc.fixtures) ? doc.fixtures : []).map((f, i) => {
    if (!isObject(f) || !finite(f.wallIndex) || !finite(f.offsetIn)) {
      throw new PlanVersionError("bad-old-document", `Fixture ${i + 1} of this version 0 plan has no wallIndex or offsetIn.`, 0);
    }
    return {
      id: typeof f.id === "string" ? f.id : `f${i + 1}`,
      kind: f.kind,
      label: typeof f.label === "string" ? f.label : "",
      placement: { mode: "wall", wallId: `w${f.wallIndex + 1}`, offsetMm: inToMm(f.offsetIn), elevationMm: 0 },
      params: isObject(f.params) ? { ...f.params } : {},
    };
  });
  const out: Raw = {
    schemaVersion: 1,
    room: { walls, ...(finite(room.ceilingIn) ? { ceilingHeightMm: inToMm(room.ceilingIn) } : {}) },
    fixtures,
  };
  if (typeof doc.units === "string") out.settings = { units: doc.units };
  if (Array.isArray(doc.materials)) out.materials = doc.materials;
  return out;
}

/** Every known step, keyed by the version it upgrades from. Add a step here whenever the schema version goes up. */
export const UPGRADE_STEPS: Readonly<Record<number, UpgradeStep>> = Object.freeze({
  0: { from: 0, describe: "Inches to millimetres; walls get ids; fixtures placed by wall id.", up: upgrade0to1 },
  1: { from: 1, describe: "Left and right as seen facing the wall (door hinges, stop-track sides, blade offsets flipped); stop tracks attached to the nearest saw on their wall.", up: upgradeSides1to2 },
  2: { from: 2, describe: "The plan's counter height; base cabinets without a carcass height keep the earlier 34-1/2 in.", up: upgradeCounter2to3 },
});

/**
 * Bring any known older plan document to the current schema version (not yet validated: parse
 * the result with planDocumentSchema). Throws PlanVersionError for a newer or unknown version.
 * Never changes its input.
 */
export function upgradePlan(raw: unknown): Raw & { schemaVersion: typeof PLAN_SCHEMA_VERSION } {
  if (!isObject(raw)) throw new PlanVersionError("not-a-plan", "A plan document is a JSON object; this is not one.");
  const version = raw.schemaVersion;
  if (version === undefined) throw new PlanVersionError("not-a-plan", "This file has no schemaVersion, so it is not a plan document (or it was damaged).");
  if (typeof version !== "number" || !Number.isInteger(version) || version < 0) {
    throw new PlanVersionError("unknown-version", `Unknown plan version ${JSON.stringify(version)}: versions are whole numbers from 0 to ${PLAN_SCHEMA_VERSION}.`, version);
  }
  if (version > PLAN_SCHEMA_VERSION) {
    throw new PlanVersionError("newer-version", `This plan was saved by a newer version of the app (plan version ${version}); this one reads up to version ${PLAN_SCHEMA_VERSION}.`, version);
  }
  let doc: Raw = structuredClone(raw);
  for (let v = version; v < PLAN_SCHEMA_VERSION; v++) {
    const step = UPGRADE_STEPS[v];
    if (!step) throw new PlanVersionError("unknown-version", `No upgrade is known from plan version ${v}.`, v);
    doc = step.up(doc);
    if (doc.schemaVersion !== v + 1) throw new Error(`Upgrade step from version ${v} did not produce version ${v + 1}.`);
  }
  return doc as Raw & { schemaVersion: typeof PLAN_SCHEMA_VERSION };
}

/** Upgrade then validate: a plan document with defaults filled in. Throws PlanVersionError or zod's ZodError. */
export function readPlanDocument(raw: unknown): PlanDocument {
  return planDocumentSchema.parse(upgradePlan(raw));
}
