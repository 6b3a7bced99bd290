/** One piece cut from a board, at `offsetMm` from the board's end. */
export interface BoardCut {
  pieceKey: string;
  partId: string;
  name: string;
  offsetMm: number;
  lengthMm: number;
  widthMm: number;
}

/** One board to buy and what comes out of it. */
export interface BoardLayout {
  index: number;
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  cuts: BoardCut[];
  /** Length of the pieces, mm. */
  usedMm: number;
  /** What is left past the last piece and one more kerf, mm (0 when nothing usable remains). */
  leftoverMm: number;
}

export interface BoardUnplaced {
  partId: string;
  name: string;
  qty: number;
  reason: string;
}

/** Boards of one material, thickness and stock width. */
export interface BoardGroup {
  materialId: string;
  materialName: string;
  thicknessMm: number;
  /** Actual (dressed) width of the stock, mm. */
  stockWidthMm: number;
  boards: BoardLayout[];
  /** Fewest boards of the longest length physically possible: piece length with kerf over usable board length, rounded up. */
  lowerBound: number;
  totalLengthMm: number;
  partLengthMm: number;
  /** Piece length / board length, percent. */
  yieldPct: number;
}

export interface BoardPlan {
  groups: BoardGroup[];
  unplaced: BoardUnplaced[];
}

export interface BoardOptions {
  kerfMm: number;
  /** Cut off each end of a board first (checks, snipe), mm. Default 1/2 in. */
  endTrimMm?: number;
  /** Lengths on sale, mm. Default 6, 8, 10, 12 ft. */
  lengthsMm?: number[];
  /** Dressed widths on sale, mm. Default 1x2 to 1x12. */
  widthsMm?: number[];
  /** Work steps for the packing (bins and pieces looked at), shared by the groups by piece count; default DEFAULT_BOARD_WORK. */
  maxWork?: number;
  /** Most pieces laid out; default PLAN_LIMITS.pieces. */
  maxPieces?: number;
}
