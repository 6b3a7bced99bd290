import type { PlanDocument } from "../plan/schema";
import { estimateElbowHeightMm } from "../ergonomics/elbow";

/**
 * Every number a rule compares against, in mm unless the name says otherwise. An instructor's
 * preset may override any of them; the plan's settings fill in the shop-specific ones.
 */
export interface RuleNumbers {
  /** Walkway clear width, 36 in (NKBA kitchen planning guidelines; secondary copy). */
  walkwayMm: number;
  /** Never below 28 in (OSHA 29 CFR 1910.36(g)(2), exit access). */
  walkwayMinMm: number;
  /** Tool table vs counters, 1/32 in by default (plan setting). */
  flushToleranceMm: number;
  /** Longest board the shop handles (plan setting). */
  longestStockMm: number;
  /** Standing elbow height (plan setting, or estimated from stature). */
  elbowHeightMm: number;
  /** Saw kerf (plan setting). */
  kerfMm: number;
  /** Share of a board that must rest on support each side of the blade so it cannot tip (statics: centre of mass over the support). */
  stockSupportFraction: number;
  /** Thickness of the stock band above the table that must be clear, 1-1/2 in (dressed 2x stock; practice). */
  stockThicknessMm: number;
  /** Wall cabinet bottom above a counter, 18 in (kitchen cabinet convention; practice). */
  wallCabinetGapMm: number;
  /** Panel working-space depth, 0-150 V to ground, all conditions: 3 ft (NEC Table 110.26(A)(1)). */
  panelDepthLowVoltageMm: number;
  /** 151-600 V, conditions 1, 2, 3: 3, 3.5, 4 ft (NEC Table 110.26(A)(1)). */
  panelDepthCond1Mm: number;
  panelDepthCond2Mm: number;
  panelDepthCond3Mm: number;
  /** Working-space width: 30 in or the equipment width (NEC 110.26(A)(2)). */
  panelMinWidthMm: number;
  /** Working-space height: 6.5 ft or the equipment height (NEC 110.26(A)(3)). */
  panelHeadroomMm: number;
  /** Dedicated space: 6 ft above the equipment or to the ceiling (NEC 110.26(E)(1)(a)). */
  panelDedicatedAboveMm: number;
  /** Light work: 10-15 cm below elbow; heavy work: 15-40 cm below (Grandjean). */
  lightWorkBelowElbowMinMm: number;
  lightWorkBelowElbowMaxMm: number;
  heavyWorkBelowElbowMaxMm: number;
  /** Forward reach, unobstructed 48 in; over an obstruction deeper than 20 in, 44 in (ADA 2010 308.2). */
  reachMaxMm: number;
  reachOverObstructionMm: number;
  reachObstructionDepthMm: number;
  /** Shelf sag guide: 0.02 in per foot of span (furniture-building practice), as mm per m. */
  sagLimitMmPerM: number;
  /** Shelf load: about 20 lb per running foot (books; practice), as kg per m. */
  shelfLoadKgPerM: number;
  /** Overlap below this is touching, not a collision (1 mm; our own tolerance). */
  collisionToleranceMm: number;
  /** Fixtures at least this tall get the anchoring caution: 27 in, the height ASTM F2057 scope starts at (memory). */
  tallFixtureMm: number;
}

const IN = 25.4;
const FT = 304.8;

/** The defaults before settings and presets. */
export const DEFAULT_RULE_NUMBERS: Readonly<RuleNumbers> = Object.freeze({
  walkwayMm: 36 * IN,
  walkwayMinMm: 28 * IN,
  flushToleranceMm: IN / 32,
  longestStockMm: 8 * FT,
  elbowHeightMm: 1090,
  kerfMm: IN / 8,
  stockSupportFraction: 0.5,
  stockThicknessMm: 1.5 * IN,
  wallCabinetGapMm: 18 * IN,
  panelDepthLowVoltageMm: 3 * FT,
  panelDepthCond1Mm: 3 * FT,
  panelDepthCond2Mm: 3.5 * FT,
  panelDepthCond3Mm: 4 * FT,
  panelMinWidthMm: 30 * IN,
  panelHeadroomMm: 6.5 * FT,
  panelDedicatedAboveMm: 6 * FT,
  lightWorkBelowElbowMinMm: 100,
  lightWorkBelowElbowMaxMm: 150,
  heavyWorkBelowElbowMaxMm: 400,
  reachMaxMm: 48 * IN,
  reachOverObstructionMm: 44 * IN,
  reachObstructionDepthMm: 20 * IN,
  sagLimitMmPerM: (0.02 * IN) / FT * 1000,
  shelfLoadKgPerM: (20 * 0.45359237) / (FT / 1000),
  collisionToleranceMm: 1,
  tallFixtureMm: 27 * IN,
});

export const RULE_NUMBER_KEYS = Object.keys(DEFAULT_RULE_NUMBERS) as (keyof RuleNumbers)[];

/** Defaults, then the plan's settings, then the preset: the numbers one evaluation uses. */
export function resolveNumbers(plan: PlanDocument, preset?: Partial<RuleNumbers>): RuleNumbers {
  const s = plan.settings;
  const fromSettings: RuleNumbers = {
    ...DEFAULT_RULE_NUMBERS,
    flushToleranceMm: s.flushToleranceMm,
    longestStockMm: s.longestStockMm,
    kerfMm: s.kerfMm,
    elbowHeightMm: s.elbowHeightMm ?? estimateElbowHeightMm(s.userHeightMm),
  };
  const clean: Partial<RuleNumbers> = {};
  for (const k of RULE_NUMBER_KEYS) {
    const v = preset?.[k];
    if (typeof v === "number" && Number.isFinite(v) && v >= 0) clean[k] = v;
  }
  return { ...fromSettings, ...clean };
}

/** The preset keys that actually apply (finite, non-negative numbers). */
export function presetKeys(preset?: Partial<RuleNumbers>): Set<keyof RuleNumbers> {
  const out = new Set<keyof RuleNumbers>();
  for (const k of RULE_NUMBER_KEYS) {
    const v = preset?.[k];
    if (typeof v === "number" && Number.isFinite(v) && v >= 0) out.add(k);
  }
  return out;
}
