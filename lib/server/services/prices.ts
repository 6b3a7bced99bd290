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

/** Replace the account's price list (validated by the caller with priceListSchema). */
export async function putPriceList(em: EntityManager, user: User, list: PriceList): Promise<PriceListView> {
  const items = list.items.map((i) => ({ ...i })) as unknown as Record<string, unknown>[];
  let row = await em.findOne(PriceListSchema, { owner: user.id });
  if (row) {
    row.items = items;
    row.currency = list.currency;
    row.updatedAt = new Date();
  } else {
    row = em.create(PriceListSchema, { owner: user, items, currency: list.currency, updatedAt: new Date() });
  }
  await em.flush();
  return { currency: "USD", items: list.items, isDefault: false, updatedAt: row.updatedAt.toISOString() };
}

/** Forget the account's prices; the example list applies again. */
export async function resetPriceList(em: EntityManager, user: User): Promise<PriceListView> {
  const row = await em.findOne(PriceListSchema, { owner: user.id });
  if (row) await em.remove(row).flush();
  return defaults();
}
