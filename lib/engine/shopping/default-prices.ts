import type { PriceList } from "./price-schema";

/**
 * Example prices in USD, made up for the demo (not quotes from any seller): every item is marked
 * `example` so the UI says so until the user enters their own. Pack sizes are in the need's unit.
 * Coverage figures for finish, glue and contact cement are rough examples too: check the label.
 */
export const DEFAULT_PRICE_LIST: PriceList = {
  currency: "USD",
  items: [
    { key: "ply-18", name: "3/4 in hardwood plywood, 4 x 8 ft sheet", unit: "sheet", packSize: 1, priceCents: 7200, example: true },
    { key: "ply-12", name: "1/2 in plywood, 4 x 8 ft sheet", unit: "sheet", packSize: 1, priceCents: 5800, example: true },
    { key: "ply-6", name: "1/4 in plywood, 4 x 8 ft sheet", unit: "sheet", packSize: 1, priceCents: 3800, example: true },
    { key: "mdf-19", name: "3/4 in MDF, 4 x 8 ft sheet", unit: "sheet", packSize: 1, priceCents: 4800, example: true },
    { key: "mdf-12", name: "1/2 in MDF, 4 x 8 ft sheet", unit: "sheet", packSize: 1, priceCents: 3900, example: true },
    { key: "pegboard-6", name: "1/4 in pegboard, 4 x 8 ft sheet", unit: "sheet", packSize: 1, priceCents: 2600, example: true },
    { key: "hardwood-19", name: "Hardwood, surfaced", unit: "board-ft", packSize: 1, priceCents: 700, example: true },
    { key: "lumber-2x", name: "Construction lumber, 2x", unit: "board-ft", packSize: 1, priceCents: 150, example: true },
    { key: "poplar-19", name: "Poplar, surfaced", unit: "board-ft", packSize: 1, priceCents: 650, example: true },
    { key: "maple-19", name: "Maple, surfaced", unit: "board-ft", packSize: 1, priceCents: 875, example: true },
    { key: "slide-*", name: "Side-mount ball-bearing slides", unit: "pair", packSize: 1, priceCents: 1800, example: true },
    { key: "hinge-*", name: "Cabinet hinge", unit: "each", packSize: 1, priceCents: 600, example: true },
    { key: "pull", name: "Pull", unit: "each", packSize: 1, priceCents: 400, example: true },
    { key: "shelf-pin", name: "Shelf pins, bag of 50", unit: "bag", packSize: 50, priceCents: 500, example: true },
    { key: "pocket-screw-*", name: "Pocket screws, box of 100", unit: "box", packSize: 100, priceCents: 800, example: true },
    { key: "screw-*", name: "Wood screws, box of 100", unit: "box", packSize: 100, priceCents: 700, example: true },
    { key: "lag-screw-*", name: "Lag screw with washer", unit: "each", packSize: 1, priceCents: 90, example: true },
    { key: "carriage-bolt-*", name: "Carriage bolt, washer and nut", unit: "each", packSize: 1, priceCents: 80, example: true },
    { key: "caster-*", name: "Caster", unit: "each", packSize: 1, priceCents: 1200, example: true },
    { key: "lag-bolt-*", name: "Bolt with washer", unit: "each", packSize: 1, priceCents: 100, example: true },
    { key: "t-track", name: "T-track, 48 in length", unit: "length", packSize: 1219.2, priceCents: 3000, example: true },
    { key: "stop-block", name: "Stop block for T-track", unit: "each", packSize: 1, priceCents: 1500, example: true },
    { key: "adhesive-tape-measure", name: "Stick-on tape measure, 12 ft", unit: "roll", packSize: 3657.6, priceCents: 1200, example: true },
    { key: "laminate", name: "High-pressure laminate, 4 x 8 ft sheet", unit: "sheet", packSize: 2.9729, priceCents: 9500, example: true },
    { key: "contact-cement", name: "Contact cement, quart (covers about 4 m2, example)", unit: "quart", packSize: 4, priceCents: 2200, example: true },
    { key: "edge-banding", name: "Iron-on edge banding, 25 ft roll", unit: "roll", packSize: 7620, priceCents: 900, example: true },
    { key: "wood-glue", name: "Wood glue, 16 oz (about 60 parts, example)", unit: "bottle", packSize: 60, priceCents: 700, example: true },
    { key: "finish", name: "Clear finish, quart (about 11 m2 a coat, example)", unit: "quart", packSize: 11, priceCents: 2000, example: true },
  ],
};
