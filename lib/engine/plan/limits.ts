/**
 * Plan-level caps: how many of each thing one plan may hold. Each is set well past what a real shop
 * reaches, so no honest plan meets it, while every loop in derive, checks, parts, nesting, shopping
 * and the CSVs stays bounded by it. docs/plan-format.md tables them with their reasons.
 */
export const PLAN_LIMITS = {
  /**
   * Fixtures in one plan. A three-car garage (about 10 x 7 m) lined on every wall with 15 in base
   * cabinets, wall cabinets above them and a rack or shelf over each, holds under 150 fixtures; 300 is
   * twice that. Checks pair fixtures that touch, so the cap also bounds the work of a full evaluation.
   */
  fixtures: 300,
  /** Walls of the room: an L-, T- or U-shaped garage has 6-12; 24 allows jogs around posts and chimneys. */
  walls: 24,
  /** Measured diagonals: two are enough for four walls; one per wall is plenty for any shape. */
  diagonals: 24,
  /** Doors and windows: two on each of 24 walls, with room to spare. */
  openings: 50,
  /** Panels, heaters, posts, outlets and parking bays. */
  obstacles: 100,
  /** Sheet goods and boards listed in the plan (a shop stocks a few dozen at most). */
  materials: 100,
  /**
   * Pieces in the parts list, counting each part's quantity and each glued-up layer. 300 default
   * base cabinets make about 14,400; a real plan makes a few thousand. Nesting, the board plan and the
   * shopping list are bounded by it.
   */
  pieces: 20_000,
  /** Cut lengths typed into one stop track's stop table. */
  cutLengths: 100,
  /** Stop blocks on one track. */
  stops: 8,
  /** Keys in one fixture's parameters before its kind reads them (a kind has about 30). */
  paramKeys: 64,
  /** Findings the analysis answer lists (the summary still counts them all). */
  analysisFindings: 2000,
} as const;
