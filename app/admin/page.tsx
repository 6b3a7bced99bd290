import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { RoleSelect } from "@/components/admin/RoleSelect";
import { requestEm } from "@/lib/server/db";
import { currentUser } from "@/lib/server/session";
import { listAccounts } from "@/lib/server/services/users";

export const metadata: Metadata = { title: "Accounts" };

export default async function AdminPage() {
  const em = await requestEm();
  const me = await currentUser(em);
  if (!me) redirect("/signin?callbackUrl=/admin");
  if (me.role !== "admin") notFound();
  const users = await listAccounts(em);
  return (
    <div className="mx-auto max-w-5xl px-4 py-8">
      <h1 className="mb-6 text-2xl font-semibold text-walnut-900">Accounts</h1>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-walnut-300 text-walnut-700">
            <tr>
              <th className="py-2 pr-4">Name</th>
              <th className="py-2 pr-4">E-mail</th>
              <th className="py-2 pr-4">Joined</th>
              <th className="py-2 pr-4">Role</th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id} className="border-b border-walnut-100">
                <td className="py-2 pr-4">{u.name}</td>
                <td className="py-2 pr-4">{u.email}</td>
                <td className="py-2 pr-4">{new Date(u.createdAt).toLocaleDateString("en-CA")}</td>
                <td className="py-2 pr-4"><RoleSelect userId={u.id} role={u.role} self={u.id === me.id} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
