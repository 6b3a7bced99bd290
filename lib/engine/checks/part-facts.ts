import type { HardwareItem, Part } from "../fixtures/types";

/** What the part rules read from one fixture's parts. */
export interface FixturePartFacts {
  fixtureId: string;
  /** Some part is laminate or glued with contact cement. */
  laminate: boolean;
  /** Shelves of distinct size and material (identical shelves sag alike). */
  shelves: Part[];
}

const LAMINATE = /laminate|contact cement/i;
const SHELF = /shelf/i;

/** Part and hardware texts repeat (a few dozen across a shop): each is tested once. */
const texts = new Map<string, boolean>();
function test(re: RegExp, cache: Map<string, boolean>, text: string): boolean {
  let v = cache.get(text);
  if (v === undefined) {
    v = re.test(text);
    if (cache.size < 10_000) cache.set(text, v);
  }
  return v;
}
const shelfNames = new Map<string, boolean>();

/** Mentions laminate or contact cement. */
export const mentionsLaminate = (text: string) => test(LAMINATE, texts, text);

function factsOf(run: readonly Part[]): FixturePartFacts {
  const seen = new Set<string>();
  const shelves: Part[] = [];
  let laminate = false;
  for (const p of run) {
    if (!laminate) laminate = mentionsLaminate(p.name) || mentionsLaminate(p.materialId) || p.joinery.some(mentionsLaminate);
    if (!test(SHELF, shelfNames, p.name)) continue;
    const key = `${Math.round(p.lengthMm)}|${Math.round(p.widthMm)}|${p.thicknessMm}|${p.materialId}`;
    if (seen.has(key)) continue;
    seen.add(key);
    shelves.push(p);
  }
  return { fixtureId: run[0].fixtureId, laminate, shelves };
}

/** Facts per first part of a fixture's run: a re-derive keeps an unchanged fixture's part objects, so they are worked out once. */
const FACTS = new WeakMap<Part, { count: number; facts: FixturePartFacts }>();

/**
 * The facts of each fixture's parts, in plan order. Derive lists a fixture's parts together; each
 * run is read again only when its parts are new objects (the fixture changed).
 */
export function partFacts(parts: readonly Part[]): FixturePartFacts[] {
  const out: FixturePartFacts[] = [];
  let i = 0;
  while (i < parts.length) {
    const first = parts[i];
    let j = i + 1;
    while (j < parts.length && parts[j].fixtureId === first.fixtureId) j++;
    const hit = FACTS.get(first);
    if (hit && hit.count === j - i) out.push(hit.facts);
    else {
      const facts = factsOf(parts.slice(i, j));
      FACTS.set(first, { count: j - i, facts });
      out.push(facts);
    }
    i = j;
  }
  return out;
}

/** Fixture ids whose hardware mentions laminate or contact cement. */
export function laminateHardware(hardware: readonly HardwareItem[]): Set<string> {
  const ids = new Set<string>();
  for (const h of hardware) if (mentionsLaminate(h.name) || mentionsLaminate(h.key)) ids.add(h.fixtureId);
  return ids;
}
