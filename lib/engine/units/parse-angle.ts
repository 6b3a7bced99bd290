/** A typed corner angle read as degrees, or a message saying what was wrong. Never throws. */
export type ParseAngleResult = { ok: true; deg: number } | { ok: false; message: string };

const NUMBER = /^(\d+(?:\.\d*)?|\.\d+)$/;
const MIXED = /^(\d+)(?:\s+|\s*-\s*)(\d+)\s*\/\s*(\d+)$/;
const DMS = /^(\d+)\s*°\s*(\d+(?:\.\d*)?)\s*['′]$/;

/** Parse an interior corner angle in degrees: "90", "90.5°", "89 1/2 deg", "90°30'". Must be between 1 and 359. */
export function parseAngle(text: string): ParseAngleResult {
  const s = (typeof text === "string" ? text : "").trim().toLowerCase();
  if (s === "") return { ok: false, message: "Enter an angle in degrees." };
  if (s.length > 24) return { ok: false, message: "That is too long to be an angle." };
  if (s.startsWith("-")) return { ok: false, message: "A corner angle cannot be negative." };
  let deg: number | null = null;
  const dms = DMS.exec(s);
  if (dms) {
    if (Number(dms[2]) >= 60) return { ok: false, message: "Minutes go up to 59: write 90°30', not 90°75'." };
    deg = Number(dms[1]) + Number(dms[2]) / 60;
  } else {
    const body = s.replace(/\s*(?:°|deg|degs|degrees?)$/, "").trim();
    const mixed = MIXED.exec(body);
    if (NUMBER.test(body)) deg = Number(body);
    else if (mixed) {
      if (Number(mixed[3]) === 0) return { ok: false, message: "A fraction cannot have 0 below the slash." };
      deg = Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
    }
  }
  if (deg === null) return { ok: false, message: `Could not read "${text.trim()}" as an angle. Try 90, 90.5° or 89 1/2.` };
  // Same bounds as the plan schema: a corner between 1 and 359 degrees (270 for an inside corner).
  if (deg < 1 || deg > 359) return { ok: false, message: "A corner angle is between 1° and 359° (90° for a square corner, 270° for an inside corner)." };
  return { ok: true, deg };
}
