import type { CheckContext } from "../context";
import { finding } from "../finding";
import { outsideDepth } from "../geom/polygon";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "in-room";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const tol = ctx.numbers.collisionToleranceMm;
  const ceiling = ctx.room.ceilingHeightMm;
  for (const f of ctx.fixtures) {
    if (ids && !ids.has(f.id)) continue;
    const outside = outsideDepth(f.body.polygon, ctx.roomPolygon);
    const above = f.body.zMax - ceiling;
    if (outside > tol) {
      out.push(
        finding(ID, "conflict", false, f.id, `${f.label} reaches ${ctx.len(outside)} beyond the walls (or through an opening).`, {
          fixtureIds: [f.id],
          measured: outside,
          required: 0,
          shortfall: outside,
          unit: "mm",
        }),
      );
    }
    if (above > tol) {
      out.push(
        finding(ID, "conflict", false, f.id, `${f.label} is ${ctx.len(above)} taller than the ceiling allows.`, {
          fixtureIds: [f.id],
          measured: f.body.zMax,
          required: ceiling,
          shortfall: above,
          unit: "mm",
        }),
      );
    }
    if (outside <= tol && above <= tol) out.push(finding(ID, "conflict", true, f.id, `${f.label} is inside the room.`, { fixtureIds: [f.id], measured: 0, required: 0, unit: "mm" }));
  }
  return out;
}

/** Every fixture inside the walls and under the ceiling. */
export const inRoomRule: Rule<CheckContext> = {
  id: ID,
  title: "Fixtures inside the room",
  protects: "A fixture drawn through a wall or out through a doorway does not exist in the real room; catching it early saves a cabinet built too long.",
  formula: "distance any corner of a fixture lies outside the walls <= 1 mm; fixture top <= ceiling height",
  numbers: [{ label: "Tolerance", value: "1 mm" }],
  sources: [{ citation: "Geometry; tolerance is our own", status: "derived" }],
  severity: "conflict",
  cautions: [],
  ...perFixture(check),
};
