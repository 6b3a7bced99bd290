import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { requestEm } from "@/lib/server/db";
import { listTeachers } from "@/lib/server/services/classes";
import { sessionUser } from "@/lib/server/viewer";

export const metadata: Metadata = { title: "Classes" };

export default async function ClassIndex() {
  const user = await sessionUser();
  if (user && (user.role === "instructor" || user.role === "admin")) redirect(`/class/${user.id}`);
  const teachers = await listTeachers(await requestEm());
  return (
    <div className="mx-auto max-w-3xl px-4 py-8">
      <h1 className="mb-4 text-2xl font-semibold text-walnut-900">Classes</h1>
      {teachers.length ? (
        <ul className="flex flex-col gap-2">
          {teachers.map((t) => (
            <li key={t.id}>
              <Link className="underline" href={`/class/${t.id}`}>{t.name}</Link>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-walnut-700">No instructor has published anything yet.</p>
      )}
    </div>
  );
}
