import { z } from "zod";
import { MM_PER_INCH } from "../units/length";
import { boundText, countRange, mmRange, numberRange, planText } from "./bounded";
import { PLAN_LIMITS } from "./limits";

/**
 * The plan document (version PLAN_SCHEMA_VERSION below). One schema: the database stores it, the API accepts it, export
 * and import use it. All lengths are millimetres; angles are degrees. Every number has a physical
 * minimum and maximum with its reason (helpers in ./bounded), and every list a cap (./limits).
 */

const id = z.string().min(1, "Cannot be empty.").max(64, "At most 64 characters.").regex(/^[A-Za-z0-9_-]+$/, "Use letters, digits, - or _.");
/** A positive length in mm, at most 100 m (the widest bound; fields use mmRange for their own). */
export const lengthMm = z.number().finite().positive("Must be greater than zero.").max(100_000, "Longer than 100 m: check the units.");
/** A length in mm that may be zero, at most 100 m. */
export const offsetMm = z.number().finite().min(0, "Cannot be negative.").max(100_000, "Longer than 100 m: check the units.");

/** Longest wall, mm (60 m, about 197 ft): past any garage or home shop. */
export const MAX_WALL_MM = 60_000;
/** Farthest anything may stand from the room's first corner, mm (100 m): past that it is a units mistake. */
export const MAX_REACH_MM = 100_000;
/** Tallest room, mm (10 m, about 33 ft): a two-storey barn. */
export const MAX_CEILING_MM = 10_000;

const inch = (n: number) => n * MM_PER_INCH;
const UNITS = "check the units";
/** How far something may sit above the floor: up to the tallest ceiling. */
const elevationMm = mmRange(0, MAX_CEILING_MM, { min: "heights are measured up from the floor", max: "higher than the tallest ceiling a plan may have" });
/** Along a wall from its start corner: within the longest wall. */
const alongWallMm = mmRange(0, MAX_WALL_MM, { min: "measured from the wall's start corner", max: "past the end of the longest wall a plan may have" });

export const unitsSchema = z.enum(["in", "ft-in", "mm"]);
export type Units = z.infer<typeof unitsSchema>;

export const settingsSchema = z.object({
  units: unitsSchema.default("in"),
  /** Denominator for inch fractions: 16 or 32. */
  precision: z.union([z.literal(16), z.literal(32)]).default(16),
  kerfMm: mmRange(0, 10, { min: "0 leaves the kerf out of every size", max: "wider than any saw blade's kerf (a full-kerf blade takes 1/8 in)" }).default(3.175),
  /** The longest board the shop must handle, mm (default 8 ft). */
  longestStockMm: mmRange(inch(12), inch(24 * 12), { min: "shorter stock needs no long-stock path", max: "longer than the longest lumber yards stock (24 ft)" }).default(2438.4),
  /** The user's stature, mm. */
  userHeightMm: mmRange(900, 2500, { min: "shorter than a young student: check the units", max: "taller than nearly anyone: check the units" }).default(1755),
  /** Standing elbow height, mm; when absent it is estimated from stature. */
  elbowHeightMm: mmRange(500, 1600, { min: "lower than a young student's elbow: check the units", max: "higher than nearly anyone's elbow: check the units" }).optional(),
  /**
   * The height the counters stand at, floor to the top of the work surface, mm (36 in: kitchen
   * convention, practice; 915 mm in metric plans). Base cabinets and workbenches follow it unless
   * one has its own height; tool shelves follow the counters beside them.
   */
  counterHeightMm: mmRange(inch(24), inch(48), { min: "lower than any standing counter", max: "higher than a standing counter for anyone (the 95th-percentile elbow stands about 46 in high)" }).default(inch(36)),
  /** Flush tolerance for tool tables and counters, mm (1/32 in by default). */
  flushToleranceMm: mmRange(0, 25, { min: "0 asks for an exact match", max: "a step of more than an inch is not flush" }).default(0.79375),
  defaultSheetMaterialId: id.default("ply-18"),
  /** An instructor's rule preset adopted by this plan, if any. */
  presetId: planText(64).nullable().default(null),
});
export type PlanSettings = z.infer<typeof settingsSchema>;

export const wallSchema = z.object({
  id,
  label: planText(60).default(""),
  /** Measured length along the floor, mm. */
  lengthMm: mmRange(inch(2), MAX_WALL_MM, { min: "a shorter jog is not a wall to measure; add it to the next wall", max: `longer than any shop building: ${UNITS}` }),
});

/** A corner number: corner i is where wall i starts. */
const corner = countRange(0, PLAN_LIMITS.walls - 1, { min: "corners count from 0", max: `a room has at most ${PLAN_LIMITS.walls} corners` });

/** A measured diagonal between two corners (corner i is where wall i starts). */
export const diagonalSchema = z.object({
  from: corner,
  to: corner,
  lengthMm: mmRange(inch(2), MAX_REACH_MM, { min: "too short to be a diagonal", max: `longer than the diagonal of the largest room: ${UNITS}` }),
});

const onWall = (minWidth: number, maxWidth: number, what: string) => ({
  wallId: id,
  offsetMm: alongWallMm,
  widthMm: mmRange(minWidth, maxWidth, { min: `narrower than any ${what}`, max: `wider than any ${what}: ${UNITS}` }),
});

export const openingSchema = z.discriminatedUnion("kind", [
  z.object({
    id,
    kind: z.literal("entry-door"),
    ...onWall(inch(18), inch(96), "door a person walks through"),
    heightMm: mmRange(inch(48), inch(120), { min: "lower than a door a person walks through", max: "taller than any entry door" }).default(2032),
    /** Hinge jamb, as seen from inside the room facing the door. */
    hinge: z.enum(["left", "right"]).default("left"),
    swing: z.enum(["in", "out"]).default("in"),
  }),
  z.object({
    id,
    kind: z.literal("garage-door"),
    ...onWall(1500, 10_000, "overhead door"),
    heightMm: mmRange(1500, 6000, { min: "lower than any overhead door", max: "taller than any overhead door" }).default(2134),
    /** How far the horizontal track runs into the room from the door wall, mm. */
    trackDepthMm: mmRange(300, 10_000, { min: "shorter than any door track", max: "a track runs no deeper than the tallest door plus its curve" }).default(3300),
    /** Headroom the track and opener take below the ceiling, mm. */
    trackDropMm: mmRange(0, 1500, { min: "0 when the track sits at the ceiling", max: "a track hangs no lower than about 5 ft below the ceiling" }).default(380),
  }),
  z.object({
    id,
    kind: z.literal("window"),
    ...onWall(inch(6), 6000, "window"),
    heightMm: mmRange(inch(6), 3000, { min: "shorter than any window", max: "taller than any window in a shop wall" }).default(900),
    sillMm: mmRange(0, 3000, { min: "measured up from the floor", max: "a sill higher than 10 ft is above any shop wall's windows" }).default(1000),
  }),
]);
export type Opening = z.infer<typeof openingSchema>;

const alongOrBefore = z
  .number({ error: "Enter a number." })
  .min(-MAX_WALL_MM, `At most ${boundText(MAX_WALL_MM)} before the wall's start corner: ${UNITS}.`)
  .max(MAX_WALL_MM, `At most ${boundText(MAX_WALL_MM)} along the wall: past the end of the longest wall a plan may have.`);
const onFloor = (axis: string) =>
  z
    .number({ error: "Enter a number." })
    .min(-MAX_REACH_MM, `Within ${boundText(MAX_REACH_MM)} of the room's first corner along ${axis}: ${UNITS}.`)
    .max(MAX_REACH_MM, `Within ${boundText(MAX_REACH_MM)} of the room's first corner along ${axis}: ${UNITS}.`);

/** Where something stands: against a wall, or free on the floor. */
export const placementSchema = z.discriminatedUnion("mode", [
  z.object({ mode: z.literal("wall"), wallId: id, offsetMm: alongOrBefore, elevationMm: elevationMm.default(0) }),
  z.object({
    mode: z.literal("free"),
    xMm: onFloor("x"),
    yMm: onFloor("y"),
    rotationDeg: numberRange(-360, 360, "degrees", { min: "one full turn is enough", max: "one full turn is enough" }).default(0),
    elevationMm: elevationMm.default(0),
  }),
]);
export type Placement = z.infer<typeof placementSchema>;

export const obstacleSchema = z.discriminatedUnion("kind", [
  z.object({
    id,
    kind: z.literal("panel"),
    placement: placementSchema,
    widthMm: mmRange(inch(8), inch(60), { min: "narrower than any breaker panel", max: "wider than a row of panels: enter each one" }).default(380),
    heightMm: mmRange(inch(12), inch(96), { min: "shorter than any breaker panel", max: "taller than any breaker panel" }).default(760),
    depthMm: mmRange(inch(1), inch(24), { min: "even a flush panel stands out its cover's depth", max: "deeper than any breaker panel" }).default(100),
    /** Voltage to ground: residential panels are 0-150 V. */
    voltageClass: z.enum(["0-150", "151-600"]).default("0-150"),
    /** NEC 110.26(A)(1) condition 1, 2 or 3. */
    condition: z.union([z.literal(1), z.literal(2), z.literal(3)]).default(1),
  }),
  z.object({
    id,
    kind: z.literal("water-heater"),
    placement: placementSchema,
    diameterMm: mmRange(inch(12), inch(48), { min: "smaller than any water heater", max: "larger than any home water heater" }).default(560),
    heightMm: mmRange(inch(18), inch(96), { min: "shorter than any water heater", max: "taller than any home water heater" }).default(1500),
  }),
  z.object({
    id,
    kind: z.literal("post"),
    placement: placementSchema,
    widthMm: mmRange(inch(2), 1500, { min: "thinner than any post that carries a beam", max: "wider than a post: draw it as walls" }).default(100),
    depthMm: mmRange(inch(2), 1500, { min: "thinner than any post that carries a beam", max: "deeper than a post: draw it as walls" }).default(100),
  }),
  z.object({
    id,
    kind: z.literal("outlet"),
    placement: placementSchema,
    widthMm: mmRange(inch(1.5), inch(16), { min: "smaller than any receptacle cover", max: "wider than a four-gang cover" }).default(70),
    heightMm: mmRange(inch(1.5), inch(16), { min: "smaller than any receptacle cover", max: "taller than any receptacle cover" }).default(115),
  }),
  z.object({
    id,
    kind: z.literal("parking-bay"),
    placement: placementSchema,
    vehicleLengthMm: mmRange(1500, 7000, { min: "shorter than a motorcycle", max: "longer than a crew-cab long-bed pickup" }).default(4900),
    vehicleWidthMm: mmRange(600, 2800, { min: "narrower than a motorcycle's handlebars", max: "wider than any vehicle that fits a garage door" }).default(1900),
    /** Space to open a door and step out, each side, mm. */
    doorSwingMm: mmRange(0, 1500, { min: "0 for no door to open", max: "a car door opens less than 5 ft" }).default(760),
  }),
]);
export type Obstacle = z.infer<typeof obstacleSchema>;

export const roomSchema = z.object({
  walls: z.array(wallSchema).min(3, "A room needs at least three walls.").max(PLAN_LIMITS.walls, `At most ${PLAN_LIMITS.walls} walls.`),
  diagonals: z.array(diagonalSchema).max(PLAN_LIMITS.diagonals, `At most ${PLAN_LIMITS.diagonals} diagonals.`).default([]),
  /** Measured interior corner angles, degrees (corner i is where wall i starts); null where not measured. */
  cornerAnglesDeg: z
    .array(numberRange(1, 359, "degrees", { min: "a corner closes to a point below that", max: "a corner opens all the way round above that" }).nullable())
    .max(PLAN_LIMITS.walls, `At most ${PLAN_LIMITS.walls} corners.`)
    .default([]),
  ceilingHeightMm: mmRange(inch(60), MAX_CEILING_MM, { min: "lower than 5 ft is a crawl space, not a shop", max: `taller than a two-storey barn: ${UNITS}` }).default(2743),
  openings: z.array(openingSchema).max(PLAN_LIMITS.openings, `At most ${PLAN_LIMITS.openings} doors and windows.`).default([]),
  obstacles: z.array(obstacleSchema).max(PLAN_LIMITS.obstacles, `At most ${PLAN_LIMITS.obstacles} obstacles.`).default([]),
});
export type Room = z.infer<typeof roomSchema>;

/** A sheet's side, mm: from 1 ft (smaller is an offcut) to 5 m. */
const sheetSideMm = mmRange(inch(12), 5000, { min: "a smaller piece is an offcut, not a sheet to buy", max: "larger than any sheet sold" });

export const materialSchema = z.object({
  id,
  name: planText(80, 1),
  form: z.enum(["sheet", "board"]),
  thicknessMm: mmRange(inch(1 / 16), 200, { min: "thinner is veneer or laminate, not stock to cut parts from", max: "thicker than any sheet or board: glue up layers" }),
  /** Sheet size for sheet goods, mm. */
  sheetLengthMm: sheetSideMm.optional(),
  sheetWidthMm: sheetSideMm.optional(),
  /** Species or product, for sag and pricing. */
  species: planText(40).optional(),
});
export type Material = z.infer<typeof materialSchema>;

/** A fixture: its kind, where it stands, and its kind's parameters (validated by the fixture registry). */
export const fixtureSchema = z.object({
  id,
  kind: planText(40, 1),
  label: planText(80).default(""),
  placement: placementSchema,
  params: z
    .record(z.string().max(64, "At most 64 characters."), z.unknown())
    .refine((p) => Object.keys(p).length <= PLAN_LIMITS.paramKeys, `At most ${PLAN_LIMITS.paramKeys} parameters.`)
    .default({}),
});
export type FixtureDoc = z.infer<typeof fixtureSchema>;

export const PLAN_SCHEMA_VERSION = 3 as const;

export const planDocumentSchema = z.object({
  schemaVersion: z.literal(PLAN_SCHEMA_VERSION).meta({ description: "Format version; older files are upgraded on import." }),
  settings: settingsSchema.default(() => settingsSchema.parse({})).meta({ description: "Units and shop settings." }),
  room: roomSchema.meta({ description: "The measured room: walls counter-clockwise, corner i where wall i starts. Lengths in mm." }),
  materials: z.array(materialSchema).max(PLAN_LIMITS.materials, `At most ${PLAN_LIMITS.materials} materials.`).default([]).meta({ description: "Sheet goods and boards the fixtures use." }),
  fixtures: z.array(fixtureSchema).max(PLAN_LIMITS.fixtures, `At most ${PLAN_LIMITS.fixtures} fixtures: more than any real shop holds. Split the plan into several.`).default([]).meta({ description: "Fixtures: kind, placement and the kind's parameters (mm)." }),
});
export type PlanDocument = z.infer<typeof planDocumentSchema>;
/** What a client may send before defaults are filled in. */
export type PlanDocumentInput = z.input<typeof planDocumentSchema>;
