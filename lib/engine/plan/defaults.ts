import { planDocumentSchema, PLAN_SCHEMA_VERSION } from "./schema";
import type { Material, PlanDocument } from "./schema";

/**
 * Stock the app starts with, mm. Thicknesses are the actual sizes of nominal stock: nominal 3/4 in
 * hardwood plywood is about 23/32 in, taken as 18 mm (HPVA HP-1; common practice), and sheets are
 * 48 x 96 in, sold as 1220 x 2440 mm (common practice). Board thickness 19 mm is surfaced 4/4 stock
 * (common practice). Species names match the stiffness table's wording (USDA Wood Handbook, Table 5-3).
 */
export const DEFAULT_MATERIALS: readonly Material[] = Object.freeze([
  { id: "ply-18", name: "3/4 in hardwood plywood (18 mm)", form: "sheet", thicknessMm: 18, sheetLengthMm: 2440, sheetWidthMm: 1220, species: "plywood" },
  { id: "ply-12", name: "1/2 in plywood (12 mm)", form: "sheet", thicknessMm: 12, sheetLengthMm: 2440, sheetWidthMm: 1220, species: "plywood" },
  { id: "ply-6", name: "1/4 in plywood (6 mm)", form: "sheet", thicknessMm: 6, sheetLengthMm: 2440, sheetWidthMm: 1220, species: "plywood" },
  // MDF is made to its stated thickness (ANSI A208.2, +/-0.005 in): 3/4 in is 19.05 mm.
  { id: "mdf-19", name: "3/4 in MDF (19 mm)", form: "sheet", thicknessMm: 19.05, sheetLengthMm: 2440, sheetWidthMm: 1220, species: "mdf" },
  { id: "poplar-19", name: "Poplar board, 3/4 in (19 mm)", form: "board", thicknessMm: 19, species: "yellow-poplar" },
  { id: "maple-19", name: "Maple board, 3/4 in (19 mm)", form: "board", thicknessMm: 19, species: "sugar maple" },
  // Stock the fixture kinds default to: face-frame and edge hardwood (surfaced 4/4, 3/4 in), 1/2 in MDF,
  // 1/4 in pegboard, and 2x construction lumber (1-1/2 in actual). Common practice.
  { id: "hardwood-19", name: "Hardwood board, 3/4 in (19 mm)", form: "board", thicknessMm: 19.05, species: "yellow-poplar" },
  { id: "mdf-12", name: "1/2 in MDF (12.7 mm)", form: "sheet", thicknessMm: 12.7, sheetLengthMm: 2440, sheetWidthMm: 1220, species: "mdf" },
  { id: "pegboard-6", name: "1/4 in pegboard (6.35 mm)", form: "sheet", thicknessMm: 6.35, sheetLengthMm: 2440, sheetWidthMm: 1220, species: "hardboard" },
  { id: "lumber-2x", name: "2x construction lumber (38 mm)", form: "board", thicknessMm: 38.1, species: "Douglas-fir (coast)" },
] satisfies Material[]);

/** A new plan: an empty two-car garage, 6.1 m wide at the door wall and 6.7 m deep (our own example), with the default stock and no fixtures. */
export function newPlanDocument(): PlanDocument {
  // Right and left as seen standing in the garage door opening, looking in.
  return planDocumentSchema.parse({
    schemaVersion: PLAN_SCHEMA_VERSION,
    room: {
      walls: [
        { id: "w1", label: "Door wall", lengthMm: 6100 },
        { id: "w2", label: "Right wall", lengthMm: 6700 },
        { id: "w3", label: "Back wall", lengthMm: 6100 },
        { id: "w4", label: "Left wall", lengthMm: 6700 },
      ],
      ceilingHeightMm: 2743,
    },
    materials: DEFAULT_MATERIALS.map((m) => ({ ...m })),
    fixtures: [],
  });
}
