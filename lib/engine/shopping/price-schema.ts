import { z } from "zod";

/**
 * One price: what it covers (`key`: a material id such as "ply-18", a hardware key such as
 * "slide-20in", or a pattern ending in "*" such as "slide-*"), what one purchase unit is, how much
 * of the need one unit covers (in the need's own unit: screws per box, mm per roll, m2 per sheet),
 * and its price in cents.
 */
export const priceItemSchema = z.object({
  key: z
    .string()
    .min(1)
    .max(64)
    .regex(/^[A-Za-z0-9_.-]+\*?$/, "Letters, digits, . _ - and an optional trailing *."),
  name: z.string().min(1).max(120),
  unit: z.string().min(1).max(24),
  packSize: z.number().finite().positive().max(1e9).default(1),
  priceCents: z.number().int().min(0).max(100_000_000),
  /** True for the app's example prices, false once the user sets a price. */
  example: z.boolean().default(false),
});
export type PriceItem = z.infer<typeof priceItemSchema>;

export const priceListSchema = z.object({
  currency: z.literal("USD").default("USD"),
  items: z
    .array(priceItemSchema)
    .max(500)
    .refine((xs) => new Set(xs.map((x) => x.key)).size === xs.length, "Each key may appear once."),
});
export type PriceList = z.infer<typeof priceListSchema>;

/** The price for a key: an exact match first, then the longest matching pattern. */
export function findPrice(items: readonly PriceItem[], key: string): PriceItem | undefined {
  const exact = items.find((p) => p.key === key);
  if (exact) return exact;
  let best: PriceItem | undefined;
  for (const p of items) {
    if (!p.key.endsWith("*")) continue;
    const stem = p.key.slice(0, -1);
    if (key.startsWith(stem) && (!best || stem.length > best.key.length - 1)) best = p;
  }
  return best;
}
