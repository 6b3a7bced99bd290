import type { EntityManager } from "@mikro-orm/postgresql";
import { z } from "zod";
import type { User } from "@/entities/User";
import { ITEM_PATTERN } from "@/lib/engine/shop/progress";
import { invalid } from "../errors";
import { accessPlan } from "../policy";

/** Check-offs one request may carry (a phone that was offline for a whole day of cutting sends them in batches). */
export const MAX_CHECKS_PER_REQUEST = 500;
/** Check-offs a plan may hold: far more than a shop's worth of pieces and undos. */
const MAX_CHECKS_PER_PLAN = 50_000;

export const progressBody = z.object({
  checks: z
    .array(
      z.object({
        id: z.string().uuid("Each check-off needs its own id (a UUID made on the phone)."),
        item: z.string().max(140, "At most 140 characters.").regex(ITEM_PATTERN, 'Use "cut:<setup>:<label>" or "step:<step>".'),
        delta: z.union([z.literal(1), z.literal(-1)], { message: "1 for a check-off, -1 for its undo." }),
        madeAt: z.string().datetime({ offset: true, message: "When it was made, as an ISO date and time." }),
      }),
    )
    .min(1, "Send at least one check-off.")
    .max(MAX_CHECKS_PER_REQUEST, `At most ${MAX_CHECKS_PER_REQUEST} check-offs at a time.`),
});

export interface ProgressItem {
  item: string;
  /** Sum of check-offs and undos (the engine clamps it to what the plan asks for). */
  count: number;
  /** Who checked it off (names), most recent first. */
  by: string[];
  lastAt: string;
}

export interface ProgressAnswer {
  items: ProgressItem[];
  /** Check-offs stored for the plan. */
  checks: number;
  serverTime: string;
}

/** Everyone's check-offs on a plan, summed per item (viewers and up). */
export async function readProgress(em: EntityManager, user: User, planId: string): Promise<ProgressAnswer> {
  const { plan } = await accessPlan(em, planId, user, "viewer");
  return summary(em, plan.id);
}

async function summary(em: EntityManager, planId: string): Promise<ProgressAnswer> {
  const rows = await em.getConnection().execute<{ item: string; count: string; by: string[]; last_at: Date; checks: string }[]>(
    `select c.item, sum(c.delta) as count, array_agg(distinct u.name) as by, max(c.made_at) as last_at, sum(count(*)) over () as checks
     from shop_check c join app_user u on u.id = c.user_id
     where c.plan_id = ? group by c.item order by c.item`,
    [planId],
  );
  return {
    items: rows.map((r) => ({ item: r.item, count: Number(r.count), by: r.by, lastAt: new Date(r.last_at).toISOString() })),
    checks: rows.length ? Number(rows[0]!.checks) : 0,
    serverTime: new Date().toISOString(),
  };
}

/**
 * Stores check-offs (viewers and up may record their own progress). A check-off whose id is already
 * stored is a repeat of one sent before and is skipped, so a retry never counts twice. A time in the
 * future (a phone's clock running ahead) is stored as now.
 */
export async function recordProgress(em: EntityManager, user: User, planId: string, input: z.infer<typeof progressBody>): Promise<ProgressAnswer & { accepted: number; repeats: number }> {
  const { plan } = await accessPlan(em, planId, user, "viewer");
  const conn = em.getConnection();
  const [{ n }] = await conn.execute<{ n: string }[]>(`select count(*) as n from shop_check where plan_id = ?`, [plan.id]);
  if (Number(n) + input.checks.length > MAX_CHECKS_PER_PLAN) {
    throw invalid(`This plan already holds ${Number(n)} check-offs, the most a plan keeps is ${MAX_CHECKS_PER_PLAN}.`);
  }
  const now = Date.now();
  const values = input.checks.map(() => "(?::uuid, now(), ?::uuid, ?::uuid, ?, ?, ?)").join(", ");
  const params = input.checks.flatMap((c) => [c.id, plan.id, user.id, c.item, c.delta, new Date(Math.min(now, Date.parse(c.madeAt))).toISOString()]);
  const inserted = await conn.execute<{ id: string }[]>(
    `insert into shop_check (id, created_at, plan_id, user_id, item, delta, made_at) values ${values} on conflict (id) do nothing returning id`,
    params,
  );
  return { ...(await summary(em, plan.id)), accepted: inserted.length, repeats: input.checks.length - inserted.length };
}
