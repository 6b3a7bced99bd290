import type { EntityManager } from "@mikro-orm/postgresql";

export interface WindowHit {
  /** False once the key has used up its requests in this window. */
  allowed: boolean;
  /** Requests counted in this window, this one included. */
  count: number;
  /** Whole seconds until the window ends (at least 1). */
  retryAfterSeconds: number;
}

/** Rows of keys unseen for a day are dropped now and then (about one call in 200), so the table stays small. */
const SWEEP_EVERY = 200;

/**
 * Counts one request against `key` in a fixed window of `windowSeconds`, in one statement on the
 * database's clock (rate_bucket; it holds across instances): the window's start is the clock rounded
 * down to the window, and a row from an earlier window starts again at 1.
 */
export async function hitFixedWindow(em: EntityManager, key: string, limit: number, windowSeconds: number): Promise<WindowHit> {
  const conn = em.getConnection();
  const row = (await conn.execute(
    `insert into rate_bucket (key, window_start, count)
       values (?, to_timestamp(floor(extract(epoch from now()) / ?) * ?), 1)
     on conflict (key) do update set
       count = case when rate_bucket.window_start = excluded.window_start then rate_bucket.count + 1 else 1 end,
       window_start = excluded.window_start
     returning count, ceil(extract(epoch from (window_start + make_interval(secs => ?) - now())))::int as remaining`,
    [key, windowSeconds, windowSeconds, windowSeconds],
    "get",
  )) as { count: number; remaining: number };
  if (Math.random() * SWEEP_EVERY < 1) await conn.execute(`delete from rate_bucket where window_start < now() - interval '1 day'`);
  return { allowed: row.count <= limit, count: row.count, retryAfterSeconds: Math.max(1, row.remaining) };
}
