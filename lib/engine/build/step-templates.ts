import type { TimeNote } from "./types";

/** PVA wood glue: open time, clamp time, cure (glue makers' data sheets, no single edition; the bottle's label governs). */
export const PVA_SOURCE = "glue makers' data sheets (no single edition); the label on the bottle governs";
export const PVA_OPEN: TimeNote = { text: "PVA glue stays open about 5-10 minutes at room temperature: dry-fit and set the clamps out before spreading.", source: PVA_SOURCE };
export const PVA_CLAMP: TimeNote = { text: "Leave clamped 30-60 minutes.", source: PVA_SOURCE };
export const PVA_CURE: TimeNote = { text: "Full cure takes about 24 h: no load on the joint before then.", source: PVA_SOURCE };
/** Solvent contact cement (makers' labels). */
export const CEMENT_FLASH: TimeNote = { text: "Coat both faces and wait until dry to the touch (often 15-30 minutes); it grabs on contact, so lay slip sheets or dowels and join once.", source: "contact cement makers' labels" };

export const CAUTION_FUMES = "Solvent contact cement vapour builds up in closed spaces and can ignite: ventilate and remove ignition sources such as pilot lights (Ontario Ministry of Labour hazard alert; CPSC 16 CFR 1302).";
export const CAUTION_ANCHOR = "Anchor through a stretcher or back rail into studs or masonry with fasteners rated for the wall; follow the fastener maker's instructions and local codes (practice).";
export const CAUTION_LIFT = "Get a helper to lift and hold cabinets and long assemblies.";
export const CAUTION_SQUARE = "Check square by measuring both diagonals: equal diagonals mean a square box (practice).";

/** When a step comes in the build, room-wide. */
export type Phase = "kicks" | "cut" | "assemble" | "install" | "top" | "track" | "repeat" | "frames" | "drawers" | "fronts" | "hang";

/** A step of a fixture kind: which of its parts it uses (by part key, the part id after the colon). */
export interface StepTemplate {
  phase: Phase;
  key: string;
  title: string;
  detail: string;
  partKeys: readonly string[];
  timeNotes?: readonly TimeNote[];
  cautions?: readonly string[];
}

const carcassGlue = (what: string): Omit<StepTemplate, "partKeys" | "key"> => ({
  phase: "assemble",
  title: `Glue up the ${what}`,
  detail: "Dry-fit first. Glue and screw or clamp the joints, then square the box before the glue grabs.",
  timeNotes: [PVA_OPEN, PVA_CLAMP],
  cautions: [CAUTION_SQUARE],
});

/** Steps of each fixture kind in build order (common practice for cabinets of sheet goods). */
export const KIND_STEPS: Record<string, readonly StepTemplate[]> = {
  "base-cabinet": [
    { phase: "kicks", key: "kick", title: "Build, level and fix the toe-kick platform", detail: "Screw the rails and cross members into a frame, set it on the floor line, shim it level from the high point and fix it down.", partKeys: ["kick-rail", "kick-cross"], cautions: ["Shim under the rails, never under the middle only, so the cabinet bears on its sides."] },
    { ...carcassGlue("carcass"), key: "carcass", partKeys: ["side", "bottom", "divider", "back"] },
    { phase: "assemble", key: "stretchers", title: "Fit the top stretchers", detail: "Pocket-screw the stretchers between the sides, flush with the top and front.", partKeys: ["stretcher"] },
    // Face frames go on the installed carcasses (practice for built-ins: each frame is fitted in place), so their
    // repeat lengths can be cut at the stop track once it is on the counter.
    { phase: "frames", key: "face-frame", title: "Build and fit the face frame", detail: "Join rails to stiles with pocket screws on a flat surface, then glue and clamp the frame to the installed carcass front, flush with its sides.", partKeys: ["stile", "rail", "stile-mid"], timeNotes: [PVA_OPEN, PVA_CLAMP] },
    { phase: "top", key: "top-core", title: "Countertop core and build-up", detail: "Glue and screw the build-up strips under the core, screws short of the top face.", partKeys: ["buildup-long", "buildup-cross", "top-core"], timeNotes: [PVA_OPEN, PVA_CURE] },
    { phase: "top", key: "top-laminate", title: "Edge and laminate the countertop", detail: "Glue the edge to the core and build-up, flush it, then bond the laminate with contact cement and trim it with a flush bit.", partKeys: ["top-edge"], timeNotes: [PVA_CLAMP, CEMENT_FLASH], cautions: [CAUTION_FUMES] },
    { phase: "drawers", key: "drawer-boxes", title: "Build the drawer boxes and fit the slides", detail: "Glue the box sides to the front and back with the bottom floating in its groove; square it; fit the slide blocking and the slides.", partKeys: ["drawer-side", "drawer-end", "drawer-bottom", "slide-blocking"], timeNotes: [PVA_OPEN, PVA_CLAMP], cautions: [CAUTION_SQUARE] },
    { phase: "fronts", key: "fronts", title: "Hang the doors and drawer fronts", detail: "Fit drawer fronts from the bottom up with spacers equal to the reveal between them (practice); hang doors; set shelves on their pins.", partKeys: ["drawer-front", "door", "shelf"] },
  ],
  "tool-shelf": [
    { ...carcassGlue("tool shelf"), key: "carcass", partKeys: ["side", "shelf", "stretcher", "lower-shelf"] },
    { phase: "install", key: "set-tool", title: "Set the tool and shim its table flush", detail: "Bolt the saw to its shelf and shim until its table is flush with the counters on both sides; check with a straightedge across both.", partKeys: [], cautions: ["Bolt the saw down through its mounting holes; follow the saw maker's manual."] },
  ],
  "stop-track": [
    { phase: "track", key: "track", title: "Fit the stop track", detail: "Rout the groove, screw the T-track in, fix the fence in line with the saw's fence, then stick the tape on at the tape offset from the stop table.", partKeys: ["fence"], cautions: ["Set the fence in line with the saw's fence with a straightedge before fixing it."] },
  ],
  "wall-cabinet": [
    { ...carcassGlue("wall cabinet"), key: "carcass", partKeys: ["back", "side", "top-bottom"] },
    { phase: "hang", key: "hang", title: "Hang the wall cabinet on its split cleat", detail: "Screw the wall half of the cleat into studs, level; hang the cabinet and screw through its back into the studs; hang doors and set shelves.", partKeys: ["cleat", "door", "shelf"], cautions: [CAUTION_ANCHOR, CAUTION_LIFT] },
  ],
};

/** The step for parts no template names: build the fixture as its parts' notes say. */
export function fallbackStep(name: string, anchored: boolean): StepTemplate {
  return { phase: anchored ? "hang" : "assemble", key: "build", title: `Build the ${name}`, detail: "Assemble as the parts' joinery notes say.", partKeys: [], timeNotes: [PVA_OPEN], cautions: anchored ? [CAUTION_ANCHOR] : [] };
}

/** Kinds that stand on or hang from a wall and must be anchored. */
export const ANCHORED_KINDS = new Set(["shelf-run", "lumber-rack", "cleat-wall", "pegboard", "wall-cabinet"]);

export const PHASES: readonly Phase[] = ["cut", "kicks", "assemble", "install", "top", "track", "repeat", "frames", "drawers", "fronts", "hang"];

const NUMBERED = /-\d+$/;

/** When a part is used in the build: its kind's template for the part's key, else the fixture's fallback step. */
export function phaseOfPart(kind: string, partId: string, fixtureId: string): Phase {
  return templateOf(kind, partKeyOf(partId, fixtureId))?.phase ?? (ANCHORED_KINDS.has(kind) ? "hang" : "assemble");
}

/** A part's key in its kind: the id after "fixtureId:", without the "-2", "-3" of a second or third of a kind. */
export const partKeyOf = (partId: string, fixtureId: string) => partId.slice(fixtureId.length + 1).replace(NUMBERED, "");

const templateCache = new Map<string, StepTemplate | null>();

/** The step template of a kind that names a part key (null: none does), looked up once per kind and key. */
export function templateOf(kind: string, key: string): StepTemplate | null {
  const k = `${kind}|${key}`;
  let t = templateCache.get(k);
  if (t === undefined) {
    t = (KIND_STEPS[kind] ?? []).find((x) => x.partKeys.includes(key)) ?? null;
    templateCache.set(k, t);
  }
  return t;
}

/** Parts used only after the stop track is fitted can be cut on it. */
export const afterTrack = (phase: Phase) => PHASES.indexOf(phase) > PHASES.indexOf("track");
