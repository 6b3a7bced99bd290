/** Millimetres: the one length unit inside the engine. Inches and fractions exist only at the edges. */
export type Mm = number & { readonly __unit: "mm" };

/** Brand a plain number of millimetres. */
export const mm = (n: number): Mm => n as Mm;

/** Exact inch definition (1959 agreement; NIST SP 811, App. B): 1 in = 25.4 mm. */
export const MM_PER_INCH = 25.4;

/** Inches to millimetres. */
export const inches = (n: number): Mm => (n * MM_PER_INCH) as Mm;

/** Millimetres to inches (a plain number, for display and trade formulas in inch-pound units). */
export const toInches = (v: Mm): number => v / MM_PER_INCH;

/** Feet to millimetres (1 ft = 304.8 mm exactly). */
export const feet = (n: number): Mm => (n * 12 * MM_PER_INCH) as Mm;
