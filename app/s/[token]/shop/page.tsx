import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ShopFloor } from "@/components/shop/ShopFloor";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { openShared } from "@/lib/server/services/share-links";

export const metadata: Metadata = { title: "At the saw (shared plan)", robots: { index: false, follow: false, nocache: true } };

/** The shop-floor view through a share link: the plan read-only, check-offs kept on the visitor's phone. */
export default async function SharedShopPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const em = await requestEm();
  const plan = await openShared(em, token, { record: false }).catch((e: unknown) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  return <ShopFloor source={{ kind: "share", token }} planName={plan.name} />;
}
