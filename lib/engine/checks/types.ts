import type { PlanDocument } from "../plan/schema";

export type Severity = "conflict" | "caution" | "advice";

/** One result of a rule: what is involved, the numbers, and a sentence with units. */
export interface Finding {
  ruleId: string;
  severity: Severity;
  /** True when the rule is met (kept so the list can show passes, e.g. "flush within 1/32 in"). */
  pass: boolean;
  fixtureIds: string[];
  zoneIds: string[];
  /** Measured and required values in the unit named by `unit` (lengths in mm). */
  measured?: number;
  required?: number;
  shortfall?: number;
  unit?: "mm" | "deg" | "mm/m" | "kg" | "%";
  message: string;
  /** The fixture or zone the finding is about; incremental re-checks replace findings by subject. */
  subjectId?: string;
  /** Where the problem is, on the floor (mm), when the rule can say (e.g. where a stock path is blocked). */
  at?: { x: number; y: number };
}

/** Where a rule's numbers come from. */
export interface RuleSource {
  /** e.g. "NFPA 70 (NEC) 110.26(A)(1)" or "common practice". */
  citation: string;
  status: "published" | "memory" | "practice" | "derived";
  note?: string;
}

/** A rule: one file each under lib/engine/checks/rules/. The /rules pages render from the same object. */
export interface Rule<D = unknown> {
  id: string;
  title: string;
  /** What the rule protects, in a sentence or two. */
  protects: string;
  formula: string;
  numbers: { label: string; value: string }[];
  sources: RuleSource[];
  severity: Severity;
  cautions: string[];
  evaluate(plan: PlanDocument, derived: D): Finding[];
  /** Kind of subject: "fixture" rules can re-check a few fixtures after a move; "plan" rules always re-run whole. */
  scope?: "fixture" | "plan";
  /** Evaluate only the findings whose subject is one of these fixture ids (incremental re-check after a move). */
  evaluateFor?(plan: PlanDocument, derived: D, subjectIds: ReadonlySet<string>): Finding[];
}
