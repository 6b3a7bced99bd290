import "server-only";
import { getServerSession } from "next-auth";
import { authOptions } from "./auth";

/** The session's user for rendering (name, role), without a database round trip; null when signed out. */
export async function sessionUser(): Promise<{ id: string; name: string; email: string; role: string } | null> {
  const s = await getServerSession(authOptions());
  if (!s?.user?.id) return null;
  return { id: s.user.id, name: s.user.name ?? s.user.email ?? "", email: s.user.email ?? "", role: s.user.role };
}
