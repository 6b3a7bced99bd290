import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { PlansList } from "@/components/plans/PlansList";
import { sessionUser } from "@/lib/server/viewer";
import { QueryProvider } from "@/app/providers";

export const metadata: Metadata = { title: "My plans" };

export default async function PlansPage() {
  if (!(await sessionUser())) redirect("/signin?callbackUrl=/plans");
  return (
    <div className="mx-auto max-w-6xl px-4 py-8">
      <h1 className="mb-6 text-2xl font-semibold text-walnut-900">My plans</h1>
      <QueryProvider>
        <PlansList />
      </QueryProvider>
    </div>
  );
}
