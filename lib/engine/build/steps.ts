import type { Part } from "../fixtures/types";
import type { BuildStep, CutRow, FixtureLetter, Setup } from "./types";
import type { Phase, StepTemplate } from "./step-templates";
import { ANCHORED_KINDS, CAUTION_ANCHOR, CAUTION_LIFT, KIND_STEPS, PHASES, fallbackStep, partKeyOf, templateOf } from "./step-templates";

interface Draft {
  phase: Phase;
  id: string;
  scope: BuildStep["scope"];
  fixtureId?: string;
  t: Pick<StepTemplate, "title" | "detail" | "timeNotes" | "cautions">;
  parts: Map<string, number>;
  cuts: boolean;
}

const add = (m: Map<string, number>, label: string, qty: number) => m.set(label, (m.get(label) ?? 0) + qty);

/**
 * The build order (room and fixtures): cut and machine every part at its setups (each setting made once), build
 * and level the toe-kick platforms, assemble each fixture, install and anchor, countertops, drawers, fronts, the stop
 * track, then what hangs on the walls. Every part is in the cutting step and in one step of its fixture.
 */
export function buildSteps(letters: readonly FixtureLetter[], parts: readonly Part[], rows: readonly CutRow[], labelOf: ReadonlyMap<string, string>, setups: readonly Setup[]): BuildStep[] {
  const byFixture = new Map<string, Part[]>();
  for (const p of parts) {
    if (p.qty <= 0) continue;
    const list = byFixture.get(p.fixtureId);
    if (list) list.push(p);
    else byFixture.set(p.fixtureId, [p]);
  }
  const drafts: Draft[] = [];
  const cut: Draft = { phase: "cut", id: "room-cut", scope: "room", t: { title: "Cut and machine the parts", detail: "Run the setups in order, making each setting once and cutting every piece that needs it. Pencil each piece's label on it as it comes off the saw." }, parts: new Map(), cuts: true };
  for (const r of rows) if (r.pieces > 0) add(cut.parts, r.label, r.pieces);
  drafts.push(cut);
  // The stop track's repeat lengths wait until the track is on its counter.
  const onTrack = setups.filter((s) => s.stopTrackId);
  if (onTrack.length) {
    const repeat: Draft = { phase: "repeat", id: "room-repeat", scope: "room", t: { title: "Cut the repeat lengths at the stop track", detail: "With the track fitted and its tape on, set a stop block at each length of the stop table and cut every piece at it; these pieces were ripped to width with the rest." }, parts: new Map(), cuts: true };
    for (const s of onTrack) for (const i of s.items) add(repeat.parts, i.label, i.qty);
    drafts.push(repeat);
  }
  const kicks: Draft = { phase: "kicks", id: "room-kicks", scope: "room", t: { title: "Build, level and fix the toe-kick platforms", detail: "Screw each platform together, set them along the floor line, shim them level from the floor's high point and fix them down, so every cabinet above starts level and in line.", cautions: ["Shim under the rails, not just in the middle, so each cabinet bears on its sides."] }, parts: new Map(), cuts: false };
  const install: Draft = { phase: "install", id: "room-install", scope: "room", t: { title: "Set and anchor the cabinets", detail: "Set each carcass on its platform, clamp neighbours face frame to face frame, screw them together and anchor them.", cautions: [CAUTION_ANCHOR, CAUTION_LIFT] }, parts: new Map(), cuts: false };
  let hasKicks = false;
  let hasCabinets = false;
  for (const f of letters) {
    const ps = byFixture.get(f.fixtureId);
    const templates = KIND_STEPS[f.kind] ?? [];
    if (f.kind === "base-cabinet") hasCabinets = true;
    const own = new Map<string, Draft>();
    const draftOf = (t: StepTemplate): Draft => {
      if (t.phase === "kicks") {
        hasKicks = true;
        return kicks;
      }
      let d = own.get(t.key);
      if (!d) own.set(t.key, (d = { phase: t.phase, id: `${f.fixtureId}-${t.key}`, scope: "fixture", fixtureId: f.fixtureId, t, parts: new Map(), cuts: false }));
      return d;
    };
    // Steps without parts (set the tool) still belong to the fixture.
    for (const t of templates) if (t.partKeys.length === 0) draftOf(t);
    if (!ps) {
      drafts.push(...own.values());
      continue;
    }
    let fallback: StepTemplate | undefined;
    for (const p of ps) {
      const t = templateOf(f.kind, partKeyOf(p.id, p.fixtureId)) ?? (fallback ??= fallbackStep(f.name, ANCHORED_KINDS.has(f.kind)));
      add(draftOf(t).parts, labelOf.get(p.id) ?? "?", p.qty);
    }
    // Keep the templates' order within the fixture.
    drafts.push(...[...own.values()].sort((a, b) => templates.findIndex((t) => a.id.endsWith(`-${t.key}`)) - templates.findIndex((t) => b.id.endsWith(`-${t.key}`))));
  }
  if (hasKicks) drafts.push(kicks);
  if (hasCabinets) drafts.push(install);
  // Setups of each label, once, so a step's setups come from its labels rather than a scan of every setup.
  const byLabel = new Map<string, number[]>();
  setups.forEach((s, i) => {
    for (const it of s.items) {
      const list = byLabel.get(it.label);
      if (!list) byLabel.set(it.label, [i]);
      else if (list[list.length - 1] !== i) list.push(i);
    }
  });
  // The cutting step runs every setup but the stop track's; the repeat step only the stop track's.
  const fits = (d: Draft, s: Setup) => (d.id === "room-cut" ? !s.stopTrackId : d.id === "room-repeat" ? !!s.stopTrackId : s.kind !== "rip" && s.kind !== "crosscut");
  const setupsOf = (labels: Iterable<string>, d: Draft) => {
    const idx = new Set<number>();
    for (const l of labels) for (const i of byLabel.get(l) ?? []) if (fits(d, setups[i])) idx.add(i);
    return [...idx].sort((a, b) => a - b).map((i) => setups[i].id);
  };
  const letterOf = new Map(letters.map((l) => [l.fixtureId, l.letter]));
  // Stable sort by phase keeps plan order within a phase.
  const ordered = drafts.map((d, i) => ({ d, i })).sort((a, b) => PHASES.indexOf(a.d.phase) - PHASES.indexOf(b.d.phase) || a.i - b.i);
  return ordered.map(({ d }, i): BuildStep => {
    return {
      id: d.id,
      order: i + 1,
      scope: d.scope,
      ...(d.fixtureId ? { fixtureId: d.fixtureId } : {}),
      title: d.scope === "fixture" ? `${letterOf.get(d.fixtureId ?? "") ?? "?"}: ${d.t.title}` : d.t.title,
      detail: d.t.detail,
      parts: [...d.parts.entries()].map(([label, qty]) => ({ label, qty })),
      setupIds: setupsOf(d.parts.keys(), d),
      timeNotes: [...(d.t.timeNotes ?? [])],
      cautions: [...(d.t.cautions ?? [])],
    };
  });
}
