import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { PresetManager } from "@/components/teaching/PresetManager";
import { sessionUser } from "@/lib/server/viewer";

export const metadata: Metadata = { title: "Rule presets" };

export default async function PresetsPage() {
  const user = await sessionUser();
  if (!user) redirect("/signin?callbackUrl=/presets");
  const teaches = user.role === "instructor" || user.role === "admin";
  return (
    <div className="mx-auto max-w-4xl px-4 py-6">
      <h1 className="mb-1 text-2xl font-semibold text-walnut-900">Rule presets</h1>
      <p className="mb-4 text-sm text-walnut-700">
        A preset sets the numbers the checks use (for example walkways of 42 in for a room of students). Plans that adopt it say so beside every finding. Code values such as panel working space can be tightened, never loosened.
      </p>
      {teaches ? <PresetManager ownerId={user.id} /> : <p className="text-walnut-700">Only instructors make presets. Published presets appear on each instructor&apos;s class page.</p>}
    </div>
  );
}
