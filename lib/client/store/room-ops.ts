import type { Obstacle, Opening, PlanDocument, PlanSettings, Room } from "@/lib/engine/plan/schema";

/** Pure edits of the room and settings; each returns a new document. */

function withRoom(doc: PlanDocument, room: Partial<Room>): PlanDocument {
  return { ...doc, room: { ...doc.room, ...room } };
}

export function setWallLength(doc: PlanDocument, wallId: string, lengthMm: number): PlanDocument {
  const walls = doc.room.walls.map((w) => (w.id === wallId ? { ...w, lengthMm } : w));
  return withRoom(doc, { walls });
}

export function setWallLabel(doc: PlanDocument, wallId: string, label: string): PlanDocument {
  return withRoom(doc, { walls: doc.room.walls.map((w) => (w.id === wallId ? { ...w, label } : w)) });
}

/** Adds a wall after the last one; corner angles are dropped since the shape changed. */
export function addWall(doc: PlanDocument, id: string, lengthMm: number): PlanDocument {
  return withRoom(doc, { walls: [...doc.room.walls, { id, label: "", lengthMm }], cornerAnglesDeg: [], diagonals: [] });
}

/** Removes a wall with everything attached to it (openings, wall fixtures and obstacles). Keeps at least three walls. */
export function removeWall(doc: PlanDocument, wallId: string): PlanDocument {
  if (doc.room.walls.length <= 3) return doc;
  const onIt = (p: { mode: string; wallId?: string }) => p.mode === "wall" && p.wallId === wallId;
  return {
    ...doc,
    room: {
      ...doc.room,
      walls: doc.room.walls.filter((w) => w.id !== wallId),
      openings: doc.room.openings.filter((o) => o.wallId !== wallId),
      obstacles: doc.room.obstacles.filter((o) => !onIt(o.placement)),
      cornerAnglesDeg: [],
      diagonals: [],
    },
    fixtures: doc.fixtures.filter((f) => !onIt(f.placement)),
  };
}

/** Sets or clears (null) the measured diagonal between two corners. */
export function setDiagonal(doc: PlanDocument, from: number, to: number, lengthMm: number | null): PlanDocument {
  const rest = doc.room.diagonals.filter((d) => !((d.from === from && d.to === to) || (d.from === to && d.to === from)));
  return withRoom(doc, { diagonals: lengthMm == null ? rest : [...rest, { from, to, lengthMm }] });
}

export function setCeilingHeight(doc: PlanDocument, ceilingHeightMm: number): PlanDocument {
  return withRoom(doc, { ceilingHeightMm });
}

export function addOpening(doc: PlanDocument, opening: Opening): PlanDocument {
  return withRoom(doc, { openings: [...doc.room.openings, opening] });
}

export function updateOpening(doc: PlanDocument, id: string, opening: Opening): PlanDocument {
  return withRoom(doc, { openings: doc.room.openings.map((o) => (o.id === id ? opening : o)) });
}

export function removeOpening(doc: PlanDocument, id: string): PlanDocument {
  return withRoom(doc, { openings: doc.room.openings.filter((o) => o.id !== id) });
}

export function addObstacle(doc: PlanDocument, obstacle: Obstacle): PlanDocument {
  return withRoom(doc, { obstacles: [...doc.room.obstacles, obstacle] });
}

export function updateObstacle(doc: PlanDocument, id: string, obstacle: Obstacle): PlanDocument {
  return withRoom(doc, { obstacles: doc.room.obstacles.map((o) => (o.id === id ? obstacle : o)) });
}

export function removeObstacle(doc: PlanDocument, id: string): PlanDocument {
  return withRoom(doc, { obstacles: doc.room.obstacles.filter((o) => o.id !== id) });
}

export function setSettings(doc: PlanDocument, patch: Partial<PlanSettings>): PlanDocument {
  return { ...doc, settings: { ...doc.settings, ...patch } };
}
