import type { EntityManager } from "@mikro-orm/postgresql";
import type { User } from "@/entities/User";
import { derivePlan } from "@/lib/engine/derive";
import { partsCsv, shoppingCsv } from "@/lib/engine/shopping/csv";
import { materialsReport } from "@/lib/engine/shopping/plan-shopping";
import { getPlan } from "./plans";
import { getPriceList } from "./prices";

export interface CsvFile {
  filename: string;
  text: string;
}

const slug = (name: string) => name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "plan";

/** The plan's parts list as CSV, sizes in the plan's units and in mm (viewer access or better). */
export async function planPartsCsv(em: EntityManager, user: User, planId: string): Promise<CsvFile> {
  const plan = await getPlan(em, user, planId);
  const d = derivePlan(plan.document);
  return { filename: `${slug(plan.name)}-parts.csv`, text: partsCsv(d.parts, plan.document.materials, plan.document.settings) };
}

/** The plan's shopping list as CSV, priced with the requesting account's price list. */
export async function planShoppingCsv(em: EntityManager, user: User, planId: string, opts: { wasteAllowancePct?: number } = {}): Promise<CsvFile> {
  const plan = await getPlan(em, user, planId);
  const prices = await getPriceList(em, user);
  const d = derivePlan(plan.document);
  const doc = plan.document;
  // A fixed seed and attempt cap keep the export the same on every download.
  const r = materialsReport(d.parts, d.hardware, doc.materials, prices.items, {
    kerfMm: doc.settings.kerfMm,
    nest: { seed: 1, maxAttempts: 120, timeBudgetMs: 2000 },
    shopping: { wasteAllowancePct: opts.wasteAllowancePct },
  });
  return { filename: `${slug(plan.name)}-shopping.csv`, text: shoppingCsv(r.shopping) };
}
