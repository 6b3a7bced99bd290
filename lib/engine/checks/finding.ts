import type { Finding, Severity } from "./types";

/** A finding with the fields every rule fills; optional numbers are left out when undefined. */
export function finding(
  ruleId: string,
  severity: Severity,
  pass: boolean,
  subjectId: string,
  message: string,
  extra: Partial<Omit<Finding, "ruleId" | "severity" | "pass" | "message" | "subjectId">> = {},
): Finding {
  const f: Finding = {
    ruleId,
    severity,
    pass,
    subjectId,
    fixtureIds: extra.fixtureIds ?? [],
    zoneIds: extra.zoneIds ?? [],
    message,
  };
  if (extra.measured !== undefined) f.measured = round(extra.measured);
  if (extra.required !== undefined) f.required = round(extra.required);
  if (extra.shortfall !== undefined) f.shortfall = round(Math.max(0, extra.shortfall));
  if (extra.unit) f.unit = extra.unit;
  if (extra.at) f.at = { x: round(extra.at.x), y: round(extra.at.y) };
  return f;
}

const round = (v: number) => Math.round(v * 100) / 100;
