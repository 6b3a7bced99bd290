import type { AccountRole } from "@/entities/User";
import "next-auth";

declare module "next-auth" {
  interface Session {
    user: { id: string; role: AccountRole; name?: string | null; email?: string | null; image?: string | null };
  }
}
