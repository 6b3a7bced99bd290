import type { Finding, Severity } from "./types";

type Extra = Partial<Omit<Finding, "ruleId" | "severity" | "pass" | "message" | "subjectId">>;

/**
 * A finding record. Built by a constructor rather than an object literal: rules make thousands per
 * evaluation, and literal allocation sites that V8 decides to tenure leave garbage in the old
 * generation that keeps young objects alive (about half of an evaluation's time went to the
 * collector that way; docs/benchmarks.md).
 */
class FindingRecord implements Finding {
  ruleId: string;
  severity: Severity;
  pass: boolean;
  subjectId: string;
  fixtureIds: string[];
  zoneIds: string[];
  message: string;
  declare measured?: number;
  declare required?: number;
  declare shortfall?: number;
  declare unit?: Finding["unit"];
  declare at?: { x: number; y: number };

  constructor(ruleId: string, severity: Severity, pass: boolean, subjectId: string, message: string, extra: Extra) {
    this.ruleId = ruleId;
    this.severity = severity;
    this.pass = pass;
    this.subjectId = subjectId;
    this.fixtureIds = extra.fixtureIds ?? [];
    this.zoneIds = extra.zoneIds ?? [];
    this.message = message;
    if (extra.measured !== undefined) this.measured = round(extra.measured);
    if (extra.required !== undefined) this.required = round(extra.required);
    if (extra.shortfall !== undefined) this.shortfall = round(Math.max(0, extra.shortfall));
    if (extra.unit) this.unit = extra.unit;
    if (extra.at) this.at = { x: round(extra.at.x), y: round(extra.at.y) };
  }
}

/** A finding with the fields every rule fills; optional numbers are left out when undefined. */
export function finding(ruleId: string, severity: Severity, pass: boolean, subjectId: string, message: string, extra: Extra = {}): Finding {
  return new FindingRecord(ruleId, severity, pass, subjectId, message, extra);
}

const round = (v: number) => Math.round(v * 100) / 100;
