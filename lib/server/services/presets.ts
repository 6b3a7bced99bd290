import type { EntityManager } from "@mikro-orm/postgresql";
import { z } from "zod";
import { RulePresetSchema, type RulePreset } from "@/entities/RulePreset";
import type { User } from "@/entities/User";
import { DEFAULT_RULE_NUMBERS, RULE_NUMBER_KEYS, type RuleNumbers } from "@/lib/engine/checks/numbers";
import { forbidden, invalid, notFound } from "../errors";

/**
 * Numbers that come from a published code (NEC 110.26 working space, the OSHA 28 in exit-access
 * floor): a class preset may tighten them but never go below the code value.
 */
const CODE_FLOORS: (keyof RuleNumbers)[] = ["walkwayMinMm", "panelDepthLowVoltageMm", "panelDepthCond1Mm", "panelDepthCond2Mm", "panelDepthCond3Mm", "panelMinWidthMm", "panelHeadroomMm", "panelDedicatedAboveMm"];

/** A preset's numbers: keys named like the engine's RuleNumbers, finite and not negative. */
export const presetNumbersSchema = z
  .record(z.string(), z.number().finite().min(0, "Cannot be negative.").max(100_000, "Longer than 100 m: check the units."))
  .superRefine((rec, ctx) => {
    for (const [k, v] of Object.entries(rec)) {
      if (!(RULE_NUMBER_KEYS as string[]).includes(k)) ctx.addIssue({ code: "custom", path: [k], message: "Not a rule number this version knows." });
      else if (CODE_FLOORS.includes(k as keyof RuleNumbers) && v < DEFAULT_RULE_NUMBERS[k as keyof RuleNumbers]) {
        ctx.addIssue({ code: "custom", path: [k], message: "A preset may tighten this code value but not loosen it." });
      }
    }
  })
  .transform((rec) => rec as Partial<RuleNumbers>);

export const presetBody = z.object({
  name: z.string().trim().min(1, "Give the preset a name.").max(120),
  description: z.string().max(2000).default(""),
  numbers: presetNumbersSchema,
  published: z.boolean().default(false),
});
export type PresetInput = z.infer<typeof presetBody>;

export interface PresetView {
  id: string;
  name: string;
  description: string;
  numbers: Partial<RuleNumbers>;
  published: boolean;
  ownerId: string;
  ownerName: string;
  updatedAt: string;
}

const view = (p: RulePreset): PresetView => ({ id: p.id, name: p.name, description: p.description, numbers: p.numbers as Partial<RuleNumbers>, published: p.published, ownerId: p.owner.id, ownerName: p.owner.name, updatedAt: p.updatedAt.toISOString() });

const teaches = (u: User | null) => u?.role === "instructor" || u?.role === "admin";

/** Who may read a preset now: anyone when published; otherwise its author and admins. */
export const presetVisible = (p: RulePreset, user: User | null): boolean => p.published || (!!user && (p.owner.id === user.id || user.role === "admin"));

function requireTeacher(user: User): void {
  if (!teaches(user)) throw forbidden("Only an instructor can make rule presets.");
}

/** Published presets (optionally one instructor's) plus, when signed in, my own drafts. */
export async function listPresets(em: EntityManager, user: User | null, opts: { ownerId?: string } = {}): Promise<PresetView[]> {
  const or: object[] = [{ published: true }];
  if (user) or.push({ owner: user.id });
  const where = { $or: or, ...(opts.ownerId ? { owner: opts.ownerId } : {}) };
  const rows = await em.find(RulePresetSchema, where, { populate: ["owner"], orderBy: { name: "asc" }, limit: 500 });
  return rows.map(view);
}

/** A preset I may see: published, mine, or any for an admin. Drafts of others answer 404. */
export async function getPreset(em: EntityManager, user: User | null, id: string): Promise<PresetView> {
  const p = await em.findOne(RulePresetSchema, { id }, { populate: ["owner"] });
  if (!p || !presetVisible(p, user)) throw notFound("That preset");
  return view(p);
}

export async function createPreset(em: EntityManager, user: User, input: PresetInput): Promise<PresetView> {
  requireTeacher(user);
  if (!Object.keys(input.numbers).length) throw invalid("Set at least one number.", { numbers: "Set at least one rule number." });
  const p = em.create(RulePresetSchema, { owner: user, name: input.name, description: input.description, numbers: input.numbers as Record<string, number>, published: input.published });
  await em.flush();
  return view(p);
}

async function ownPreset(em: EntityManager, user: User, id: string): Promise<RulePreset> {
  const p = await em.findOne(RulePresetSchema, { id }, { populate: ["owner"] });
  if (!p || !presetVisible(p, user)) throw notFound("That preset");
  if (p.owner.id !== user.id && user.role !== "admin") throw forbidden("Only the instructor who made this preset can change it.");
  return p;
}

export async function updatePreset(em: EntityManager, user: User, id: string, input: PresetInput): Promise<PresetView> {
  const p = await ownPreset(em, user, id);
  if (!Object.keys(input.numbers).length) throw invalid("Set at least one number.", { numbers: "Set at least one rule number." });
  p.name = input.name;
  p.description = input.description;
  p.numbers = input.numbers as Record<string, number>;
  p.published = input.published;
  await em.flush();
  return view(p);
}

export async function deletePreset(em: EntityManager, user: User, id: string): Promise<void> {
  const p = await ownPreset(em, user, id);
  em.remove(p);
  await em.flush();
}
