/**
 * Build packet: time to work out the packet's content (engine) and to lay out the PDF, and the
 * file's size and pages, for the demo plan and a generated plan of about 300 parts. Runs in this
 * process, as the packet worker thread does. Goals from the packet issue: demo <= 3 s, 300 parts <= 10 s.
 */
import type { BenchTable } from "../bench";
import { demoPlan } from "../../lib/engine/demo/demo-plan";
import { derivePlan } from "../../lib/engine/derive";
import { generatePlan } from "../../lib/engine/demo/generate-plan";
import type { PlanDocument } from "../../lib/engine/plan/schema";
import { DEFAULT_PRICE_LIST } from "../../lib/engine/shopping/default-prices";
import { buildPacketData } from "../../lib/server/packet/packet-data";
import { renderPacketPdf } from "../../lib/server/packet/render";
import type { PacketInput } from "../../lib/server/packet/types";
import { fmt } from "./timing";

export const title = "Build packet";
export const order = 70;

const RUNS = 3;

const pieces = (doc: PlanDocument) => derivePlan(doc).parts.reduce((s, p) => s + p.qty, 0);

/** The smallest generated plan (seed 1) with at least `target` pieces. */
function planWithPieces(target: number): { doc: PlanDocument; n: number; pieces: number } {
  for (let n = 4; n <= 200; n += 2) {
    const doc = generatePlan(n, 1);
    const p = pieces(doc);
    if (p >= target) return { doc, n, pieces: p };
  }
  throw new Error(`no generated plan reaches ${target} pieces`);
}

const input = (doc: PlanDocument, name: string): PacketInput => ({
  doc,
  name,
  ownerName: "Bench",
  revision: 1,
  updatedAt: "2026-12-02T12:00:00.000Z",
  shopUrl: "http://127.0.0.1:3000/plans/00000000-0000-4000-8000-000000000000/shop",
  shared: false,
  preset: null,
  prices: DEFAULT_PRICE_LIST.items,
});

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export async function run(): Promise<BenchTable[]> {
  const big = planWithPieces(300);
  const sets: [string, PlanDocument, number][] = [
    ["demo plan", demoPlan(), pieces(demoPlan())],
    [`generated (${big.n} fixtures, seed 1)`, big.doc, big.pieces],
  ];
  const rows: (string | number)[][] = [];
  // One warm-up: fonts load and the renderer compiles on first use, as in a fresh worker.
  await renderPacketPdf(buildPacketData(input(demoPlan(), "warm-up")));
  for (const [name, doc, count] of sets) {
    const content: number[] = [];
    const pdf: number[] = [];
    let bytes = 0;
    let pages = 0;
    for (let i = 0; i < RUNS; i++) {
      const t0 = performance.now();
      const data = buildPacketData(input(doc, name));
      const t1 = performance.now();
      const buf = await renderPacketPdf(data);
      const t2 = performance.now();
      content.push(t1 - t0);
      pdf.push(t2 - t1);
      bytes = buf.length;
      pages = (buf.toString("latin1").match(/\/Type \/Page\b/g) ?? []).length;
    }
    const total = median(content.map((c, i) => c + pdf[i]));
    const goal = name === "demo plan" ? 3000 : 10_000;
    rows.push([name, count, pages, fmt(median(content)), fmt(median(pdf)), fmt(total), `${(bytes / 1024).toFixed(0)} KB`, total <= goal ? "ok" : "MISS"]);
  }
  return [
    {
      title: "Build packet: time and size (one thread, median of 3 warm runs)",
      note: "content = engine work (derive, checks, nesting, boards, build order, drawings); PDF = @react-pdf/renderer layout and writing. Goal: demo <= 3 s, about 300 pieces <= 10 s. The server runs this in its packet worker thread and keeps the finished file while the plan is unchanged.",
      columns: ["plan", "pieces", "pages", "content ms", "PDF ms", "total ms", "size", "goal"],
      rows,
    },
  ];
}
