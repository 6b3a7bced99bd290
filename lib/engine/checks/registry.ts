import type { CheckContext } from "./context";
import { anchorFixturesRule } from "./rules/anchor-fixtures";
import { collisionsRule } from "./rules/collisions";
import { counterHeightRule } from "./rules/counter-height";
import { dustRule } from "./rules/dust";
import { electricalWorkRule } from "./rules/electrical-work";
import { inRoomRule } from "./rules/in-room";
import { openingsClearRule } from "./rules/openings-clear";
import { panelWorkingSpaceRule } from "./rules/panel-working-space";
import { parkingBayRule } from "./rules/parking-bay";
import { pullOutRule } from "./rules/pull-out";
import { reachRule } from "./rules/reach";
import { sawGuardingRule } from "./rules/saw-guarding";
import { shelfSagRule } from "./rules/shelf-sag";
import { solventFumesRule } from "./rules/solvent-fumes";
import { stockPathRule } from "./rules/stock-path";
import { stopReachRule } from "./rules/stop-reach";
import { stopTrackAttachedRule } from "./rules/stop-track-attached";
import { stopTrackHeightRule } from "./rules/stop-track-height";
import { stopTrackRunRule } from "./rules/stop-track-run";
import { sawInfeedOutfeedRule } from "./rules/table-saw-clearance";
import { tableFlushRule } from "./rules/tool-table-flush";
import { walkwayRule } from "./rules/walkway";
import { wallCabinetRule } from "./rules/wall-cabinets";
import type { Rule } from "./types";

/** Every rule, in the order the list and the /rules index show them. */
export const RULES: readonly Rule<CheckContext>[] = [
  tableFlushRule,
  stockPathRule,
  sawInfeedOutfeedRule,
  walkwayRule,
  panelWorkingSpaceRule,
  openingsClearRule,
  pullOutRule,
  parkingBayRule,
  collisionsRule,
  inRoomRule,
  counterHeightRule,
  wallCabinetRule,
  reachRule,
  shelfSagRule,
  stopReachRule,
  stopTrackAttachedRule,
  stopTrackHeightRule,
  stopTrackRunRule,
  anchorFixturesRule,
  sawGuardingRule,
  dustRule,
  solventFumesRule,
  electricalWorkRule,
];

const byId = new Map(RULES.map((r) => [r.id, r]));

/** The rule with this id, or undefined. */
export function getRule(id: string): Rule<CheckContext> | undefined {
  return byId.get(id);
}
