import fc from "fast-check";
import type { z } from "zod";
import { FIXTURE_KINDS } from "@/lib/engine/fixtures/registry";
import { DEFAULT_MATERIALS } from "@/lib/engine/plan/defaults";
import { PLAN_SCHEMA_VERSION, obstacleSchema, openingSchema, placementSchema, settingsSchema } from "@/lib/engine/plan/schema";
import type { PlanDocumentInput } from "@/lib/engine/plan/schema";

/**
 * fast-check arbitraries built from the plan's own zod schemas, so every bound the schema sets is
 * tried: each number is its minimum, its maximum or a value between; each list up to its cap.
 */

interface Def {
  type: string;
  innerType?: z.ZodType;
  in?: z.ZodType;
  options?: z.ZodType[];
  values?: unknown[];
  entries?: Record<string, string | number>;
  element?: z.ZodType;
  checks?: { _zod: { def: { check: string; value?: number; format?: string; minimum?: number; maximum?: number } } }[];
}
const defOf = (s: z.ZodType): Def => (s as unknown as { _zod: { def: Def } })._zod.def;
const shapeOf = (s: z.ZodType) => (s as unknown as { shape: Record<string, z.ZodType> }).shape;

const MATERIAL_IDS = DEFAULT_MATERIALS.map((m) => m.id);

function numberArb(d: Def): fc.Arbitrary<number> {
  let min = -1e5;
  let max = 1e5;
  let int = false;
  for (const c of d.checks ?? []) {
    const cd = c._zod.def;
    if (cd.check === "greater_than" && cd.value !== undefined) min = cd.value;
    if (cd.check === "less_than" && cd.value !== undefined) max = cd.value;
    if (cd.check === "number_format" && (cd.format === "safeint" || cd.format === "int32")) int = true;
  }
  if (int) return fc.oneof(fc.constant(min), fc.constant(max), fc.integer({ min, max }));
  return fc.oneof(fc.constant(min), fc.constant(max), fc.double({ min, max, noNaN: true, noDefaultInfinity: true }));
}

/** Values the schema accepts, extremes included; keys with defaults may be left out. `key` names the field (material references get real ids). */
export function arbOf(schema: z.ZodType, key = ""): fc.Arbitrary<unknown> {
  const d = defOf(schema);
  switch (d.type) {
    case "default":
    case "prefault":
    case "optional":
      return arbOf(d.innerType!, key);
    case "nullable":
      return fc.option(arbOf(d.innerType!, key), { nil: null });
    case "pipe":
      return arbOf(d.in!, key);
    case "number":
      return numberArb(d);
    case "boolean":
      return fc.boolean();
    case "enum":
      return fc.constantFrom(...Object.values(d.entries ?? {}));
    case "literal":
      return fc.constantFrom(...(d.values ?? []));
    case "union":
      return fc.oneof(...(d.options ?? []).map((o) => arbOf(o, key)));
    case "string":
      if (/material/i.test(key) || ["carcass", "back", "fronts", "drawerBox", "drawerBottom", "toeKick"].includes(key)) return fc.constantFrom(...MATERIAL_IDS);
      return fc.constantFrom("A", "Left run", "x".repeat(20), "\u00e9\u{1F6E0}");
    case "array": {
      let minLength = 0;
      let maxLength = 4;
      for (const c of d.checks ?? []) {
        const cd = c._zod.def;
        if (cd.check === "min_length" && cd.minimum !== undefined) minLength = cd.minimum;
        if (cd.check === "max_length" && cd.maximum !== undefined) maxLength = cd.maximum;
      }
      return fc.array(arbOf(d.element!, key), { minLength, maxLength });
    }
    case "object": {
      const shape = shapeOf(schema);
      const rec: Record<string, fc.Arbitrary<unknown>> = {};
      for (const [k, v] of Object.entries(shape)) rec[k] = arbOf(v, k);
      const required = Object.entries(shape)
        .filter(([, v]) => !["default", "prefault", "optional"].includes(defOf(v).type))
        .map(([k]) => k);
      return fc.record(rec, { requiredKeys: required as never[] });
    }
    default:
      return fc.constant(undefined);
  }
}

/** A fixture of any kind with parameters at or between their bounds; parameters the kind's cross-checks refuse fall back to its defaults. */
export const fixtureArb = fc.constantFrom(...FIXTURE_KINDS).chain((kind) =>
  fc.record({
    kind: fc.constant(kind.kind),
    params: arbOf(kind.paramsSchema as z.ZodType).map((p) => (kind.paramsSchema.safeParse(p).success ? (p as Record<string, unknown>) : {})),
    placement: arbOf(placementSchema),
  }),
);

const wallLength = fc.constantFrom(50.8, 6100, 60_000, 2500);

/** A plan the schema accepts: four walls at their extremes, extreme settings, obstacles and openings, and up to `maxFixtures` fixtures. */
export function planArb(maxFixtures: number): fc.Arbitrary<PlanDocumentInput> {
  return fc
    .record({
      walls: fc.array(wallLength, { minLength: 4, maxLength: 4 }),
      ceiling: fc.constantFrom(1524, 10_000, 2743),
      settings: arbOf(settingsSchema),
      openings: fc.array(arbOf(openingSchema), { maxLength: 3 }),
      obstacles: fc.array(arbOf(obstacleSchema), { maxLength: 3 }),
      fixtures: fc.array(fixtureArb, { minLength: 1, maxLength: maxFixtures }),
    })
    .map((r) => {
      const wallIds = ["w1", "w2", "w3", "w4"];
      const fixPlacement = (p: unknown, i: number) => {
        const pl = p as { mode: string; wallId?: string };
        return pl.mode === "wall" ? { ...pl, wallId: wallIds[i % 4] } : pl;
      };
      const settings = { ...(r.settings as Record<string, unknown>), defaultSheetMaterialId: "ply-18", presetId: null };
      return {
        schemaVersion: PLAN_SCHEMA_VERSION,
        settings,
        room: {
          walls: r.walls.map((lengthMm, i) => ({ id: wallIds[i], lengthMm })),
          ceilingHeightMm: r.ceiling,
          openings: r.openings.map((o, i) => ({ ...(o as object), id: `o${i}`, wallId: wallIds[i % 4] })),
          obstacles: r.obstacles.map((o, i) => ({ ...(o as { placement: unknown }), id: `b${i}`, placement: fixPlacement((o as { placement: unknown }).placement, i) })),
        },
        materials: DEFAULT_MATERIALS.map((m) => ({ ...m })),
        fixtures: r.fixtures.map((f, i) => ({ id: `f${i}`, kind: f.kind, label: "", placement: fixPlacement(f.placement, i), params: f.params })),
      } as unknown as PlanDocumentInput;
    });
}
