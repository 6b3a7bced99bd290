/**
 * Modulus of elasticity (MOE) of shelf materials, psi. Each row names its source and how sure it is,
 * so the rule pages and tests can show it.
 */
export interface StiffnessRow {
  key: string;
  name: string;
  /** Modulus of elasticity in bending, psi. */
  moePsi: number;
  source: string;
  status: "published" | "memory" | "practice" | "secondary";
  /** Tabulated from centre-loaded small clear beams (span/depth 14), so it includes shear deflection. */
  includesShear: boolean;
}

/** 1 MPa = 145.0377 psi (NIST SP 811, App. B: 1 psi = 6.894757 kPa). */
export const PSI_PER_MPA = 145.0377377;

const WOOD_HANDBOOK = "USDA FPL Wood Handbook, FPL-GTR-190 (2010), ch. 5, Table 5-3b, 12% MC";

const wood = (key: string, name: string, millionPsi: number, status: StiffnessRow["status"] = "published"): StiffnessRow => ({
  key,
  name,
  moePsi: millionPsi * 1e6,
  source: WOOD_HANDBOOK,
  status,
  includesShear: true,
});

/** The stiffness table. Solid wood from the Wood Handbook; sheet goods from product standards. */
export const STIFFNESS: readonly StiffnessRow[] = [
  wood("yellow-birch", "Yellow birch", 2.01),
  wood("sugar-maple", "Sugar (hard) maple", 1.83),
  wood("red-maple", "Red (soft) maple", 1.64),
  wood("northern-red-oak", "Northern red oak", 1.82),
  // Recalled from memory, not read in a copy of the table.
  wood("white-oak", "White oak", 1.78, "memory"),
  wood("eastern-white-pine", "Eastern white pine", 1.24),
  wood("douglas-fir-coast", "Douglas-fir (coast)", 1.95),
  wood("yellow-poplar", "Yellow-poplar", 1.58),
  {
    key: "plywood",
    name: "Plywood (along the face grain)",
    // A materials datasheet gives 1.2-1.5 x 10^6 psi for sheathing grades; we take the low end.
    moePsi: 1.2e6,
    source: "plywood materials datasheet (sheathing grade), 1.2-1.5 x 10^6 psi; low end used",
    status: "secondary",
    includesShear: false,
  },
  { key: "mdf-130", name: "MDF grade 130", moePsi: 2400 * PSI_PER_MPA, source: "ANSI A208.2 (MOE 2,400 MPa)", status: "memory", includesShear: false },
  { key: "mdf-155", name: "MDF grade 155", moePsi: 3450 * PSI_PER_MPA, source: "ANSI A208.2 (MOE 3,450 MPa)", status: "memory", includesShear: false },
  { key: "particleboard-m2", name: "Particleboard M-2", moePsi: 2250 * PSI_PER_MPA, source: "ANSI A208.1, Table 1 (MOE 2,250 MPa)", status: "memory", includesShear: false },
];

const byKey = new Map(STIFFNESS.map((r) => [r.key, r]));

/** The stiffness row for a material key, or undefined. */
export function stiffnessOf(key: string): StiffnessRow | undefined {
  return byKey.get(key);
}

/** Keys of the stiffness table, for parameter schemas. */
export const STIFFNESS_KEYS = STIFFNESS.map((r) => r.key) as [string, ...string[]];
