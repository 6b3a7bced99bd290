/** The demo accounts `npm start` seeds (scripts/seed.ts) and lists in its banner; the README lists the same. */
import type { AccountRole } from "../entities/User";

export const DEMO_PASSWORD = "sawdust-and-pine-42";

export const DEMO_ACCOUNTS: { email: string; name: string; role: AccountRole }[] = [
  { email: "robin@demo.benchwright.test", name: "Robin Alder", role: "member" },
  { email: "ines@demo.benchwright.test", name: "Ines Larch", role: "instructor" },
  { email: "avery@demo.benchwright.test", name: "Avery Birch", role: "admin" },
];

/** The banner's lines: every account with its role, and the one password they share. */
export function demoBanner(): string {
  const rows = DEMO_ACCOUNTS.map((a) => `    ${a.role.padEnd(11)} ${a.email}`);
  return [`  Demo accounts (password for all ${DEMO_ACCOUNTS.length}: ${DEMO_PASSWORD})`, ...rows].join("\n");
}
