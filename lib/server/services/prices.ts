import { randomUUID } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { PriceListSchema } from "@/entities/PriceList";
import type { User } from "@/entities/User";
import { DEFAULT_PRICE_LIST } from "@/lib/engine/shopping/default-prices";
import { priceItemSchema, type PriceItem, type PriceList } from "@/lib/engine/shopping/price-schema";

export interface PriceListView {
  currency: "USD";
  items: PriceItem[];
  /** True while the account has not saved prices of its own: the items are the app's examples. */
  isDefault: boolean;
  updatedAt: string | null;
}

const defaults = (): PriceListView => ({ currency: "USD", items: DEFAULT_PRICE_LIST.items.map((i) => ({ ...i })), isDefault: true, updatedAt: null });

/** The account's price list, or the example list when it has none. Stored items that no longer validate are skipped. */
export async function getPriceList(em: EntityManager, user: User): Promise<PriceListView> {
  const row = await em.findOne(PriceListSchema, { owner: user.id });
  if (!row) return defaults();
  const items = row.items.flatMap((raw) => {
    const p = priceItemSchema.safeParse(raw);
    return p.success ? [p.data] : [];
  });
  return { currency: "USD", items, isDefault: false, updatedAt: row.updatedAt.toISOString() };
}

/**
 * Replace the account's price list (validated by the caller with priceListSchema). One statement
 * (insert, or update on the owner's row) so two first saves at once cannot both insert.
 */
export async function putPriceList(em: EntityManager, user: User, list: PriceList): Promise<PriceListView> {
  const items = list.items.map((i) => ({ ...i })) as unknown as Record<string, unknown>[];
  const now = new Date();
  const row = await em.upsert(
    PriceListSchema,
    { id: randomUUID(), createdAt: now, owner: user.id, items, currency: list.currency, updatedAt: now },
    { onConflictFields: ["owner"], onConflictAction: "merge", onConflictMergeFields: ["items", "currency", "updatedAt"] },
  );
  return { currency: "USD", items: list.items, isDefault: false, updatedAt: row.updatedAt.toISOString() };
}

/** Forget the account's prices; the example list applies again. */
export async function resetPriceList(em: EntityManager, user: User): Promise<PriceListView> {
  const row = await em.findOne(PriceListSchema, { owner: user.id });
  if (row) await em.remove(row).flush();
  return defaults();
}
