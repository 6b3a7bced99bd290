import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { getPriceList, putPriceList, resetPriceList } from "@/lib/server/services/prices";
import { priceListSchema } from "@/lib/engine/shopping/price-schema";

/** My price list (the example list until I save my own). */
export const GET = route(async () => {
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ prices: await getPriceList(em, user) });
});

/** Replace my price list: { currency: "USD", items: [{ key, name, unit, packSize, priceCents }] }. */
export const PUT = route(async (req) => {
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, priceListSchema, 200_000);
  return json({ prices: await putPriceList(em, user, body) });
});

/** Go back to the example prices. */
export const DELETE = route(async () => {
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ prices: await resetPriceList(em, user) });
});
