import { randomUUID } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { PlanRole } from "../policy";

/**
 * A save in one SQL statement and one round trip, since saves come in bursts from every open editor:
 * lock the live plan row (only for an account with a role on it), and if the caller may edit and
 * `version` is the stored one, write the new document with version + 1 and copy the replaced one
 * into plan_revision inside the database (the old document never travels to the app and back).
 * One statement is one transaction: both writes land or neither does.
 *
 * Concurrent saves at the same version queue on the row lock (FOR UPDATE); once the first commits,
 * the next re-reads the locked row (READ COMMITTED re-check), finds the version moved on and writes
 * nothing, so it is answered 409. The document goes as a bound parameter, parsed to jsonb by the
 * server, not quoted into the SQL text.
 */
const SAVE_SQL = `
with cur as (
  select p.id, p.version, p.name, p.document, p.owner_id,
         case when p.owner_id = ?::uuid then 'owner' else m.role end as role
  from plan p
  left join plan_member m on m.plan_id = p.id and m.user_id = ?::uuid
  where p.id = ?::uuid and p.deleted_at is null and (p.owner_id = ?::uuid or m.id is not null)
  for update of p
), saved as (
  update plan p
  set document = ?::jsonb, units = ?, name = coalesce(?, p.name), version = p.version + 1, updated_at = ?
  from cur
  where p.id = cur.id and cur.version = ? and cur.role in ('owner', 'editor')
  returning p.id, p.name, p.units, p.version, p.created_at, p.updated_at, p.copied_from
), revision as (
  insert into plan_revision (id, created_at, plan_id, version, name, document, author_id)
  select ?::uuid, ?, cur.id, cur.version, cur.name, cur.document, ?::uuid
  from cur join saved on saved.id = cur.id
)
select cur.version as current_version, cur.role, owner.name as owner_name,
       saved.name, saved.units, saved.version, saved.created_at, saved.updated_at, saved.copied_from
from cur
join app_user owner on owner.id = cur.owner_id
left join saved on saved.id = cur.id`;

interface SaveRow {
  current_version: number;
  role: PlanRole;
  owner_name: string;
  name: string | null;
  units: string | null;
  version: number | null;
  /** Timestamps as the ORM's driver set-up hands them over (text), read with new Date(). */
  created_at: string | Date | null;
  updated_at: string | Date | null;
  copied_from: string | null;
}

export type SaveOutcome =
  /** No live plan with that id on which the account has a role. */
  | { kind: "missing" }
  /** A role too low to edit; nothing written. */
  | { kind: "read-only"; role: PlanRole }
  /** `version` was not the stored one; nothing written. */
  | { kind: "stale"; currentVersion: number }
  | { kind: "saved"; role: PlanRole; name: string; units: string; version: number; ownerName: string; createdAt: Date; updatedAt: Date; copiedFrom: string | null };

export interface SaveInput {
  planId: string;
  userId: string;
  /** The version the caller loaded. */
  version: number;
  /** The validated document, as JSON text. */
  documentJson: string;
  units: string;
  name?: string;
}

/** Saves a plan document with optimistic locking and a revision of the replaced one, in one statement. */
export async function saveDocument(em: EntityManager, input: SaveInput): Promise<SaveOutcome> {
  const now = new Date();
  const u = input.userId;
  const bindings = [u, u, input.planId, u, input.documentJson, input.units, input.name ?? null, now, input.version, randomUUID(), now, u];
  const result = (await em.getKnex().raw(SAVE_SQL, bindings)) as { rows: SaveRow[] };
  const row = result.rows[0];
  if (!row || !row.role) return { kind: "missing" };
  if (row.role !== "owner" && row.role !== "editor") return { kind: "read-only", role: row.role };
  if (row.version === null) return { kind: "stale", currentVersion: row.current_version };
  return {
    kind: "saved",
    role: row.role,
    name: row.name!,
    units: row.units!,
    version: row.version,
    ownerName: row.owner_name,
    createdAt: new Date(row.created_at!),
    updatedAt: new Date(row.updated_at!),
    copiedFrom: row.copied_from,
  };
}
