import { getFixtureKind } from "../fixtures/registry";
import { PLAN_LIMITS } from "./limits";
import type { PlanDocument } from "./schema";
import { planDocumentSchema } from "./schema";
import { PlanVersionError, upgradePlan } from "./upgrade";

/** One problem with an incoming plan: a dotted path such as `fixtures.3.params.widthMm`, and a message. */
export interface PlanIssue {
  path: string;
  message: string;
}

export type ParsePlanResult = { ok: true; plan: PlanDocument } | { ok: false; issues: PlanIssue[] };

const dotted = (path: readonly PropertyKey[]) => path.map((p) => String(p)).join(".");

/**
 * Read a plan from outside (API body, import file, stored JSON): upgrade older versions, validate the document,
 * then each fixture's parameters against its kind (defaults filled in), and check ids and wall references.
 * Lengths are mm. Never throws for bad input; never changes its input.
 */
export function parsePlan(input: unknown): ParsePlanResult {
  let raw: unknown;
  try {
    raw = upgradePlan(input);
  } catch (e) {
    if (e instanceof PlanVersionError) return { ok: false, issues: [{ path: "schemaVersion", message: e.message }] };
    return { ok: false, issues: [{ path: "", message: e instanceof Error ? e.message : "Not a plan document." }] };
  }
  const doc = planDocumentSchema.safeParse(raw);
  if (!doc.success) return { ok: false, issues: doc.error.issues.map((i) => ({ path: dotted(i.path), message: i.message })) };
  const plan = doc.data;
  const issues: PlanIssue[] = [];
  const wallIds = new Set<string>();
  plan.room.walls.forEach((w, i) => {
    if (wallIds.has(w.id)) issues.push({ path: `room.walls.${i}.id`, message: `Another wall already has the id "${w.id}".` });
    wallIds.add(w.id);
  });
  const checkWall = (path: string, placement: PlanDocument["fixtures"][number]["placement"]) => {
    if (placement.mode === "wall" && !wallIds.has(placement.wallId)) issues.push({ path: `${path}.placement.wallId`, message: `There is no wall "${placement.wallId}".` });
  };
  plan.room.openings.forEach((o, i) => {
    if (!wallIds.has(o.wallId)) issues.push({ path: `room.openings.${i}.wallId`, message: `There is no wall "${o.wallId}".` });
  });
  plan.room.obstacles.forEach((o, i) => checkWall(`room.obstacles.${i}`, o.placement));
  const fixtureIds = new Set<string>();
  const fixtures = plan.fixtures.map((f, i) => {
    const at = `fixtures.${i}`;
    if (fixtureIds.has(f.id)) issues.push({ path: `${at}.id`, message: `Another fixture already has the id "${f.id}".` });
    fixtureIds.add(f.id);
    checkWall(at, f.placement);
    const kind = getFixtureKind(f.kind);
    if (!kind) {
      issues.push({ path: `${at}.kind`, message: `Unknown fixture kind "${f.kind}".` });
      return f;
    }
    const p = kind.paramsSchema.safeParse(f.params);
    if (!p.success) {
      for (const iss of p.error.issues) issues.push({ path: [at, "params", dotted(iss.path)].filter(Boolean).join("."), message: iss.message });
      return f;
    }
    return { ...f, params: p.data as Record<string, unknown> };
  });
  if (issues.length) return { ok: false, issues };
  const pieces = pieceCount(plan, fixtures);
  if (pieces > PLAN_LIMITS.pieces) {
    const n = (v: number) => v.toLocaleString("en-US");
    issues.push({ path: "fixtures", message: `These fixtures make ${n(pieces)} pieces; a plan may have at most ${n(PLAN_LIMITS.pieces)}, more than any real shop needs. Split it into several plans.` });
    return { ok: false, issues };
  }
  return { ok: true, plan: { ...plan, fixtures } };
}

/** Pieces the fixtures make (each part's quantity), counted until past the limit. Bounded: at most PLAN_LIMITS.fixtures kinds' parts. */
function pieceCount(plan: PlanDocument, fixtures: PlanDocument["fixtures"]): number {
  const ctx = { settings: plan.settings, materials: plan.materials };
  let total = 0;
  for (const f of fixtures) {
    const kind = getFixtureKind(f.kind);
    if (!kind) continue;
    for (const p of kind.parts(f.id, f.params, ctx)) total += p.qty;
    if (total > PLAN_LIMITS.pieces) break;
  }
  return total;
}
