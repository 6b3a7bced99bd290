import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { ShopFloor } from "@/components/shop/ShopFloor";
import { requestEm } from "@/lib/server/db";
import { AppError } from "@/lib/server/errors";
import { currentUser } from "@/lib/server/session";
import { getPlan } from "@/lib/server/services/plans";

export const metadata: Metadata = { title: "At the saw" };

/** The shop-floor view of a plan (owners, editors, viewers): setups, stop tables, build steps and check-offs. */
export default async function PlanShopPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const em = await requestEm();
  const user = await currentUser(em);
  if (!user) redirect(`/signin?callbackUrl=/plans/${id}/shop`);
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const plan = await getPlan(em, user, id).catch((e: unknown) => {
    if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
    throw e;
  });
  return <ShopFloor source={{ kind: "plan", planId: plan.id }} planName={plan.name} />;
}
