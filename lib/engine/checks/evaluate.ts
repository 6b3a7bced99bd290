import type { Derived } from "../derive-types";
import type { PlacedFixture } from "../fixtures/types";
import type { Bounds2 } from "../geometry/types";
import type { PlanDocument } from "../plan/schema";
import { buildContext, fixtureSolid, zoneItem, type CheckContext, type EvaluateOptions } from "./context";
import { boundsOverlap, expandBounds, polygonBounds, unionBounds } from "./geom/polygon";
import { isMiterStation } from "./kinds";
import { RULES } from "./registry";
import type { Finding, Rule } from "./types";

/** Severity order for sorting: conflicts first. */
const ORDER = { conflict: 0, caution: 1, advice: 2 } as const;

const RULE_INDEX = new Map(RULES.map((r, i) => [r.id, i]));
const cmp = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Failing before passing; conflicts, then cautions, then advice; then rule order, subject and message (a stable order). */
export function sortFindings(list: Finding[]): Finding[] {
  // One number per finding for the first three keys, so most comparisons never touch the strings.
  const rank = new Float64Array(list.length);
  const order = new Array<number>(list.length);
  for (let i = 0; i < list.length; i++) {
    const f = list[i];
    rank[i] = (Number(f.pass) * 3 + ORDER[f.severity]) * 1000 + (RULE_INDEX.get(f.ruleId) ?? 99);
    order[i] = i;
  }
  order.sort((i, j) => rank[i] - rank[j] || cmp(list[i].subjectId ?? "", list[j].subjectId ?? "") || cmp(list[i].message, list[j].message));
  return order.map((i) => list[i]);
}

function runRule(rule: Rule<CheckContext>, plan: PlanDocument, ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  try {
    return ids && rule.evaluateFor ? rule.evaluateFor(plan, ctx, ids) : rule.evaluate(plan, ctx);
  } catch (e) {
    // One broken rule must not hide the others' findings.
    return [{ ruleId: rule.id, severity: "caution", pass: false, fixtureIds: [], zoneIds: [], subjectId: rule.id, message: `This check could not run: ${(e as Error).message}` }];
  }
}

/** Evaluates every rule on a derived plan; lengths in mm. `opts.preset` overrides rule numbers. */
export function evaluatePlan(plan: PlanDocument, derived: Derived, opts: EvaluateOptions = {}): Finding[] {
  const ctx = buildContext(plan, derived, opts);
  return sortFindings(RULES.flatMap((r) => runRule(r, plan, ctx)));
}

/** How far a fixture's checks reach, on the floor: its body and zones, grown by the walkway, or by the longest stock for a saw. */
function reachBounds(f: PlacedFixture, ctx: CheckContext, cache: WeakMap<PlacedFixture, Bounds2>): Bounds2 {
  const hit = cache.get(f);
  if (hit) return hit;
  const b = reachBoundsOf(f, ctx);
  cache.set(f, b);
  return b;
}

function reachBoundsOf(f: PlacedFixture, ctx: CheckContext): Bounds2 {
  let b = polygonBounds(f.body.polygon);
  for (const z of f.zones) b = unionBounds(b, polygonBounds(z.prism.polygon));
  const grow = isMiterStation(f) ? Math.max(ctx.numbers.longestStockMm, ctx.numbers.walkwayMm) : ctx.numbers.walkwayMm;
  return expandBounds(b, grow + 1);
}

/** A checker that keeps its indexes and findings, and re-checks only what a moved fixture can affect. */
export interface IncrementalChecker {
  findings(): Finding[];
  /** Re-check after fixtures moved or changed: pass the new plan and its derived results, and the ids that changed. */
  update(plan: PlanDocument, derived: Derived, changedIds: readonly string[]): Finding[];
  /** The fixture ids the last update re-checked (for tests and benchmarks). */
  lastRechecked(): ReadonlySet<string>;
}

/** Starts an incremental checker with a full evaluation. */
export function createChecker(plan: PlanDocument, derived: Derived, opts: EvaluateOptions = {}): IncrementalChecker {
  let ctx = buildContext(plan, derived, opts);
  let current = RULES.flatMap((r) => runRule(r, plan, ctx));
  let rechecked: ReadonlySet<string> = new Set();
  // Reach bounds per placed fixture object: unchanged fixtures keep their object across re-derives.
  const reachCache = new WeakMap<PlacedFixture, Bounds2>();
  return {
    findings: () => sortFindings(current),
    lastRechecked: () => rechecked,
    update(nextPlan, nextDerived, changedIds) {
      const changed = new Set(changedIds);
      // Also catch fixtures the caller did not name (a tool shelf re-levelled after its counter moved, adds, deletes).
      const seen = new Set<string>();
      for (const f of nextDerived.fixtures) {
        seen.add(f.id);
        const before = ctx.fixtureById.get(f.id);
        if (!before || (before !== f && !sameShape(before, f))) changed.add(f.id);
      }
      for (const id of ctx.fixtureById.keys()) if (!seen.has(id)) changed.add(id);
      // Areas touched: each changed fixture's old and new extent (body and zones).
      const touched: Bounds2[] = [];
      for (const id of changed) {
        const before = ctx.fixtureById.get(id);
        if (before) touched.push(expandBounds(unionAll(before), 1));
      }
      const nextById = new Map(nextDerived.fixtures.map((f) => [f.id, f]));
      for (const id of changed) {
        const after = nextById.get(id);
        if (after) touched.push(expandBounds(unionAll(after), 1));
      }
      // Same room, same obstacles: patch the indexes in place instead of rebuilding them.
      const oldCtx = ctx;
      for (const id of changed) {
        const before = oldCtx.fixtureById.get(id);
        if (before) {
          oldCtx.solids.remove(fixtureSolid(before).key);
          for (const z of before.zones) oldCtx.zoneIndex.remove(z.id);
        }
        const after = nextById.get(id);
        if (after) {
          const s = fixtureSolid(after);
          oldCtx.solids.insert(s.key, s.bounds, s);
          for (const z of after.zones) {
            const item = zoneItem(z);
            oldCtx.zoneIndex.insert(z.id, item.bounds, item);
          }
        }
      }
      ctx = { ...oldCtx, ...nextDerived, plan: nextPlan, fixtureById: nextById, roomPolygon: nextDerived.room.corners };
      // Subjects to re-check: changed fixtures, fixtures whose reach meets a touched area, and subjects of findings naming a changed fixture.
      const subjects = new Set<string>(changed);
      for (const f of nextDerived.fixtures) {
        if (subjects.has(f.id)) continue;
        const rb = reachBounds(f, ctx, reachCache);
        if (touched.some((t) => boundsOverlap(rb, t))) subjects.add(f.id);
      }
      for (const fd of current) if (fd.fixtureIds.some((x) => changed.has(x)) && fd.subjectId) for (const s of fd.subjectId.split("|")) subjects.add(s);
      const next: Finding[] = [];
      const incremental = new Set(RULES.filter((r) => r.scope === "fixture" && r.evaluateFor).map((r) => r.id));
      // Keep earlier findings of fixture rules whose subjects were not re-checked.
      for (const fd of current) {
        if (!incremental.has(fd.ruleId)) continue;
        const sid = fd.subjectId ?? "";
        const hit = sid.includes("|") ? sid.split("|").some((s) => subjects.has(s)) : subjects.has(sid);
        if (!hit) next.push(fd);
      }
      for (const rule of RULES) {
        if (incremental.has(rule.id)) {
          next.push(...runRule(rule, nextPlan, ctx, subjects));
        } else {
          next.push(...runRule(rule, nextPlan, ctx));
        }
      }
      current = next;
      rechecked = subjects;
      return sortFindings(current);
    },
  };
}

const samePrism = (a: PlacedFixture["body"], b: PlacedFixture["body"]) =>
  a.zMin === b.zMin && a.zMax === b.zMax && a.polygon.length === b.polygon.length && a.polygon.every((p, i) => p.x === b.polygon[i].x && p.y === b.polygon[i].y);

/** Same body, work surface and zones (a re-derived but unmoved fixture). */
function sameShape(a: PlacedFixture, b: PlacedFixture): boolean {
  return (
    a.workSurfaceMm === b.workSurfaceMm &&
    a.label === b.label &&
    sameTrack(a.track, b.track) &&
    samePrism(a.body, b.body) &&
    a.zones.length === b.zones.length &&
    a.zones.every((z, i) => z.id === b.zones[i].id && samePrism(z.prism, b.zones[i].prism))
  );
}

/** Same stop-track mount (both undefined for other kinds). */
function sameTrack(a: PlacedFixture["track"], b: PlacedFixture["track"]): boolean {
  if (!a || !b) return a === b;
  return a.sawId === b.sawId && a.attached === b.attached && a.side === b.side && a.startFromBladeMm === b.startFromBladeMm && a.tableMm === b.tableMm && a.counterTopMm === b.counterTopMm && a.counterRunMm === b.counterRunMm;
}

function unionAll(f: PlacedFixture): Bounds2 {
  let b = polygonBounds(f.body.polygon);
  for (const z of f.zones) b = unionBounds(b, polygonBounds(z.prism.polygon));
  return b;
}
