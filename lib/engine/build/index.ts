import type { Derived } from "../derive-types";
import { derivePlan } from "../derive";
import { cuttable } from "../nesting/pieces";
import type { PlanDocument } from "../plan/schema";
import { displayStepMm, formatLength } from "../units/format-length";
import { cutSetups } from "./cut-setups";
import { joinerySetups } from "./joinery";
import { cutRows, fixtureLetters } from "./labels";
import { buildSteps } from "./steps";
import { NO_SAW, buildStopTables, stopTracks, trackReaches } from "./stop-tables";
import { afterTrack, phaseOfPart } from "./step-templates";
import type { BuildResult, CutRow } from "./types";

/** The fixture of a row's i-th part id (ids are fixtureId:key; fixture ids hold no colon). */
const partFixture = (r: CutRow, i: number) => r.partIds[i].slice(0, r.partIds[i].indexOf(":"));

export type { BuildResult, BuildStep, BuildStopRow, BuildStopTable, CutRow, FixtureLetter, Setup, SetupItem, SetupKind, Station, TimeNote } from "./types";
export { compareLabels, fixtureLetter, fixtureLetters } from "./labels";
export { readJoinery } from "./joinery";
export { STATION_INFO } from "./setup-kinds";

/**
 * The day at the saw from a plan and its derived parts (mm): labelled cut list with twins merged, machine setups in
 * run order (rips, crosscuts, joinery), each stop track's stop table and the build steps. Pure; problems come back
 * as notes, never as exceptions.
 */
export function buildPlan(plan: PlanDocument, derived: Pick<Derived, "parts"> & Partial<Pick<Derived, "fixtures">>): BuildResult {
  const notes: string[] = [];
  const letters = fixtureLetters(plan);
  const mats = new Map(plan.materials.map((m) => [m.id, m]));
  const fmt = (mm: number) => formatLength(mm, { units: plan.settings.units, precision: plan.settings.precision });
  const { rows, labelOf } = cutRows(letters, derived.parts, plan.materials);
  if (rows.length === 0) notes.push(plan.fixtures.length === 0 ? "The plan has no fixtures yet, so there is nothing to cut: add a cabinet or a shelf." : "The plan's fixtures have no parts to cut.");
  for (const r of rows) {
    const mat = mats.get(r.materialId);
    if (!cuttable(r)) notes.push(`${r.label} ${r.name}: a size is zero or not a number, so it is left out of the setups; check the fixture's sizes.`);
    else if (!mat) notes.push(`${r.label} ${r.name}: material "${r.materialId}" is not in the plan's materials; add it so the part can be bought and cut.`);
    else if (r.thicknessMm < mat.thicknessMm - 0.5) notes.push(`${r.label} ${r.name} is ${fmt(r.thicknessMm)} thick, thinner than its stock (${mat.name}): rip or plane it to thickness after cutting.`);
  }
  const tracks = stopTracks(plan, letters, notes, derived.fixtures);
  const kindOf = new Map(letters.map((l) => [l.fixtureId, l.kind]));
  const late = new Set(rows.filter((r) => r.partIds.every((id, i) => afterTrack(phaseOfPart(kindOf.get(partFixture(r, i)) ?? "", id, partFixture(r, i))))).map((r) => r.label));
  const cuts = cutSetups(rows, mats, trackReaches(tracks, plan.settings.kerfMm), fmt, displayStepMm(plan.settings), late);
  const joints = joinerySetups(rows, fmt);
  // Run order: rips, crosscuts, machined joints; then the repeat lengths at the stop track once it is fitted; pocket
  // holes last, as each assembly comes up.
  const setups = [...cuts.filter((s) => !s.stopTrackId), ...joints.filter((s) => s.kind !== "pocket-screw"), ...cuts.filter((s) => s.stopTrackId), ...joints.filter((s) => s.kind === "pocket-screw")];
  setups.forEach((s, i) => (s.order = i + 1));
  const stopTables = buildStopTables(plan, tracks, setups);
  for (const t of stopTables) for (const n of t.notes) if (n.startsWith(NO_SAW)) notes.push(`Stop track ${t.letter} (${t.name}): ${n}`);
  const steps = buildSteps(letters, derived.parts, rows, labelOf, setups);
  return { kerfMm: plan.settings.kerfMm, fixtures: letters, rows, setups, stopTables, steps, notes, labelOf: Object.fromEntries(labelOf) };
}

/** buildPlan after deriving the plan; a plan whose room cannot be derived gives an empty result with a note. */
export function buildFromPlan(plan: PlanDocument): BuildResult {
  let derived: Derived;
  try {
    derived = derivePlan(plan);
  } catch {
    return { kerfMm: plan.settings.kerfMm, fixtures: fixtureLetters(plan), rows: [], setups: [], stopTables: [], steps: [], notes: ["The plan could not be worked out (check the room's measurements), so there is nothing to cut yet."], labelOf: {} };
  }
  return buildPlan(plan, derived);
}
