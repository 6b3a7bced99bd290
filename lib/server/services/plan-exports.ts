import type { EntityManager } from "@mikro-orm/postgresql";
import type { User } from "@/entities/User";
import { partsCsvInWorker, shoppingCsvInWorker } from "../engine-pool/engine";
import { getPlan } from "./plans";
import { getPriceList } from "./prices";

export interface CsvFile {
  filename: string;
  text: string;
}

const slug = (name: string) => name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "plan";

/** The plan's parts list as CSV, sizes in the plan's units and in mm (viewer access or better); worked out in the engine's worker pool. */
export async function planPartsCsv(em: EntityManager, user: User, planId: string, opts: { signal?: AbortSignal } = {}): Promise<CsvFile> {
  const plan = await getPlan(em, user, planId);
  return { filename: `${slug(plan.name)}-parts.csv`, text: await partsCsvInWorker(plan.document, opts) };
}

/** The plan's shopping list as CSV, priced with the requesting account's price list; worked out in the engine's worker pool. */
export async function planShoppingCsv(em: EntityManager, user: User, planId: string, opts: { wasteAllowancePct?: number; signal?: AbortSignal } = {}): Promise<CsvFile> {
  const plan = await getPlan(em, user, planId);
  const prices = await getPriceList(em, user);
  return { filename: `${slug(plan.name)}-shopping.csv`, text: await shoppingCsvInWorker(plan.document, prices.items, opts.wasteAllowancePct, { signal: opts.signal }) };
}
