type Raw = Record<string, unknown>;

const isObject = (v: unknown): v is Raw => typeof v === "object" && v !== null && !Array.isArray(v);

/** A base cabinet's carcass height up to version 2 when none was given, mm (34-1/2 in). */
const V2_CARCASS_HEIGHT_MM = 876.3;

/**
 * Version 3 adds the plan's counter height (settings.counterHeightMm, default 36 in), which base
 * cabinets and workbenches follow when they have no height of their own. A version 2 base cabinet
 * without a carcass height stood at 34-1/2 in: it keeps that height as its own, so no cabinet moves.
 * A version 2 workbench without a height stood at 36 in, the new default counter height: it follows.
 */
export function upgradeCounter2to3(doc: Raw): Raw {
  const fixtures = Array.isArray(doc.fixtures)
    ? doc.fixtures.map((f) => {
        if (!isObject(f) || f.kind !== "base-cabinet") return f;
        const params = isObject(f.params) ? f.params : {};
        return params.carcassHeightMm === undefined ? { ...f, params: { ...params, carcassHeightMm: V2_CARCASS_HEIGHT_MM } } : f;
      })
    : doc.fixtures;
  return { ...doc, schemaVersion: 3, ...(fixtures === undefined ? {} : { fixtures }) };
}
