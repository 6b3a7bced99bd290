/** Millimetres: the one length unit inside the engine. Inches and fractions exist only at the edges. */
export type Mm = number & { readonly __unit: "mm" };

/** Brand a plain number of millimetres. */
export const mm = (n: number): Mm => n as Mm;

/** Exact inch definition (1959 agreement; NIST SP 811, App. B): 1 in = 25.4 mm. */
export const MM_PER_INCH = 25.4;

/** Exact foot definition: 1 ft = 12 in = 304.8 mm (NIST SP 811, App. B); written out so floats do not show. */
export const MM_PER_FOOT = 304.8;

/** Inches to millimetres. */
export const inches = (n: number): Mm => (n * MM_PER_INCH) as Mm;

/** Millimetres to inches (a plain number, for display and trade formulas in inch-pound units). */
export const toInches = (v: Mm): number => v / MM_PER_INCH;

/** Feet to millimetres (1 ft = 304.8 mm exactly). */
export const feet = (n: number): Mm => (n * MM_PER_FOOT) as Mm;


/** The units a person reads and types lengths in: decimal or fractional inches, feet and inches, or millimetres. Same values as the plan's `settings.units`. */
export type LengthUnits = "in" | "ft-in" | "mm";

/** Denominator for inch fractions. Same values as the plan's `settings.precision`. */
export type InchPrecision = 16 | 32;

/** Longest length the app accepts anywhere, mm (100 m): anything longer is a units mistake. */
export const MAX_LENGTH_MM = 100_000;
