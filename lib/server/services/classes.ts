import type { EntityManager } from "@mikro-orm/postgresql";
import { RulePresetSchema } from "@/entities/RulePreset";
import { UserSchema } from "@/entities/User";
import { WalkthroughSchema } from "@/entities/Walkthrough";
import { notFound } from "../errors";
import { stillServed } from "./walkthroughs";

export interface Teacher {
  id: string;
  name: string;
}

/** Instructors with something published (walk-throughs only while they still serve), for the class index. */
export async function listTeachers(em: EntityManager): Promise<Teacher[]> {
  const [walks, p] = await Promise.all([
    em.find(WalkthroughSchema, { published: true, plan: { deletedAt: null } }, { populate: ["owner", "plan"], limit: 500 }),
    em.find(RulePresetSchema, { published: true }, { populate: ["owner"], fields: ["owner"], limit: 500 }),
  ]);
  const w = await stillServed(em, walks);
  const seen = new Map<string, Teacher>();
  for (const row of [...w, ...p]) seen.set(row.owner.id, { id: row.owner.id, name: row.owner.name });
  return [...seen.values()].sort((a, b) => a.name.localeCompare(b.name));
}

/** An instructor's public name; other accounts answer 404 (members have no class page). */
export async function teacher(em: EntityManager, id: string): Promise<Teacher> {
  const u = /^[0-9a-f-]{36}$/i.test(id) ? await em.findOne(UserSchema, { id, role: { $in: ["instructor", "admin"] } }) : null;
  if (!u) throw notFound("That class");
  return { id: u.id, name: u.name };
}
