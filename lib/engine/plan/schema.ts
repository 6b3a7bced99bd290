import { z } from "zod";

/**
 * The plan document, version 1. One schema: the database stores it, the API accepts it, export
 * and import use it. All lengths are millimetres; angles are degrees.
 */

const id = z.string().min(1).max(64).regex(/^[A-Za-z0-9_-]+$/, "Use letters, digits, - or _.");
/** A positive length in mm, at most 100 m. */
export const lengthMm = z.number().finite().positive("Must be greater than zero.").max(100_000, "Longer than 100 m: check the units.");
/** A length in mm that may be zero. */
export const offsetMm = z.number().finite().min(0, "Cannot be negative.").max(100_000, "Longer than 100 m: check the units.");

export const unitsSchema = z.enum(["in", "ft-in", "mm"]);
export type Units = z.infer<typeof unitsSchema>;

export const settingsSchema = z.object({
  units: unitsSchema.default("in"),
  /** Denominator for inch fractions: 16 or 32. */
  precision: z.union([z.literal(16), z.literal(32)]).default(16),
  kerfMm: z.number().min(0).max(10).default(3.175),
  /** The longest board the shop must handle, mm (default 8 ft). */
  longestStockMm: lengthMm.default(2438.4),
  /** The user's stature, mm. */
  userHeightMm: lengthMm.max(2500).default(1755),
  /** Standing elbow height, mm; when absent it is estimated from stature. */
  elbowHeightMm: lengthMm.max(1600).optional(),
  /** Flush tolerance for tool tables and counters, mm (1/32 in by default). */
  flushToleranceMm: z.number().min(0).max(25).default(0.79375),
  defaultSheetMaterialId: id.default("ply-18"),
  /** An instructor's rule preset adopted by this plan, if any. */
  presetId: z.string().max(64).nullable().default(null),
});
export type PlanSettings = z.infer<typeof settingsSchema>;

export const wallSchema = z.object({
  id,
  label: z.string().max(60).default(""),
  /** Measured length along the floor, mm. */
  lengthMm,
});

/** A measured diagonal between two corners (corner i is where wall i starts). */
export const diagonalSchema = z.object({ from: z.number().int().min(0), to: z.number().int().min(0), lengthMm });

const onWall = { wallId: id, offsetMm, widthMm: lengthMm };

export const openingSchema = z.discriminatedUnion("kind", [
  z.object({ id, kind: z.literal("entry-door"), ...onWall, heightMm: lengthMm.default(2032), hinge: z.enum(["left", "right"]).default("left"), swing: z.enum(["in", "out"]).default("in") }),
  z.object({
    id,
    kind: z.literal("garage-door"),
    ...onWall,
    heightMm: lengthMm.default(2134),
    /** How far the horizontal track runs into the room from the door wall, mm. */
    trackDepthMm: lengthMm.default(3300),
    /** Headroom the track and opener take below the ceiling, mm. */
    trackDropMm: offsetMm.default(380),
  }),
  z.object({ id, kind: z.literal("window"), ...onWall, heightMm: lengthMm.default(900), sillMm: offsetMm.default(1000) }),
]);
export type Opening = z.infer<typeof openingSchema>;

/** Where something stands: against a wall, or free on the floor. */
export const placementSchema = z.discriminatedUnion("mode", [
  z.object({ mode: z.literal("wall"), wallId: id, offsetMm: z.number().finite().min(-100_000).max(100_000), elevationMm: offsetMm.default(0) }),
  z.object({ mode: z.literal("free"), xMm: z.number().finite(), yMm: z.number().finite(), rotationDeg: z.number().finite().default(0), elevationMm: offsetMm.default(0) }),
]);
export type Placement = z.infer<typeof placementSchema>;

export const obstacleSchema = z.discriminatedUnion("kind", [
  z.object({
    id,
    kind: z.literal("panel"),
    placement: placementSchema,
    widthMm: lengthMm.default(380),
    heightMm: lengthMm.default(760),
    depthMm: lengthMm.default(100),
    /** Voltage to ground: residential panels are 0-150 V. */
    voltageClass: z.enum(["0-150", "151-600"]).default("0-150"),
    /** NEC 110.26(A)(1) condition 1, 2 or 3. */
    condition: z.union([z.literal(1), z.literal(2), z.literal(3)]).default(1),
  }),
  z.object({ id, kind: z.literal("water-heater"), placement: placementSchema, diameterMm: lengthMm.default(560), heightMm: lengthMm.default(1500) }),
  z.object({ id, kind: z.literal("post"), placement: placementSchema, widthMm: lengthMm.default(100), depthMm: lengthMm.default(100) }),
  z.object({ id, kind: z.literal("outlet"), placement: placementSchema, widthMm: lengthMm.default(70), heightMm: lengthMm.default(115) }),
  z.object({
    id,
    kind: z.literal("parking-bay"),
    placement: placementSchema,
    vehicleLengthMm: lengthMm.default(4900),
    vehicleWidthMm: lengthMm.default(1900),
    /** Space to open a door and step out, each side, mm. */
    doorSwingMm: offsetMm.default(760),
  }),
]);
export type Obstacle = z.infer<typeof obstacleSchema>;

export const roomSchema = z.object({
  walls: z.array(wallSchema).min(3, "A room needs at least three walls.").max(24),
  diagonals: z.array(diagonalSchema).max(24).default([]),
  /** Measured interior corner angles, degrees (corner i is where wall i starts); null where not measured. */
  cornerAnglesDeg: z.array(z.number().min(1).max(359).nullable()).max(24).default([]),
  ceilingHeightMm: lengthMm.default(2743),
  openings: z.array(openingSchema).max(50).default([]),
  obstacles: z.array(obstacleSchema).max(100).default([]),
});
export type Room = z.infer<typeof roomSchema>;

export const materialSchema = z.object({
  id,
  name: z.string().min(1).max(80),
  form: z.enum(["sheet", "board"]),
  thicknessMm: lengthMm.max(200),
  /** Sheet size for sheet goods, mm. */
  sheetLengthMm: lengthMm.optional(),
  sheetWidthMm: lengthMm.optional(),
  /** Species or product, for sag and pricing. */
  species: z.string().max(40).optional(),
});
export type Material = z.infer<typeof materialSchema>;

/** A fixture: its kind, where it stands, and its kind's parameters (validated by the fixture registry). */
export const fixtureSchema = z.object({
  id,
  kind: z.string().min(1).max(40),
  label: z.string().max(80).default(""),
  placement: placementSchema,
  params: z.record(z.string(), z.unknown()).default({}),
});
export type FixtureDoc = z.infer<typeof fixtureSchema>;

export const PLAN_SCHEMA_VERSION = 1 as const;

export const planDocumentSchema = z.object({
  schemaVersion: z.literal(PLAN_SCHEMA_VERSION).meta({ description: "Format version; older files are upgraded on import." }),
  settings: settingsSchema.default(() => settingsSchema.parse({})).meta({ description: "Units and shop settings." }),
  room: roomSchema.meta({ description: "The measured room: walls counter-clockwise, corner i where wall i starts. Lengths in mm." }),
  materials: z.array(materialSchema).max(100).default([]).meta({ description: "Sheet goods and boards the fixtures use." }),
  fixtures: z.array(fixtureSchema).max(2000).default([]).meta({ description: "Fixtures: kind, placement and the kind's parameters (mm)." }),
});
export type PlanDocument = z.infer<typeof planDocumentSchema>;
/** What a client may send before defaults are filled in. */
export type PlanDocumentInput = z.input<typeof planDocumentSchema>;
