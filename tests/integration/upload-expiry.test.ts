/**
 * Unconfirmed uploads (raw files, GPS data and all) expire: the app's scheduled clean-up (a pg-boss
 * job on the same PostgreSQL) removes an upload older than UPLOAD_EXPIRY_HOURS (24 h by default)
 * from storage and its row; younger ones stay. The test backdates a row and sends the job itself,
 * so the app's own worker runs it.
 */
import { describe, it, expect, beforeAll, afterAll } from "vitest";
import { HeadObjectCommand, S3Client } from "@aws-sdk/client-s3";
import pg from "pg";
import PgBoss from "pg-boss";
import { hasServer, newMember, type Client } from "./helpers/client";
import { sampleDoc } from "./helpers/sharing";

const enabled = hasServer && !!process.env.DATABASE_URL && !!process.env.S3_ENDPOINT;
const bucket = process.env.S3_BUCKET ?? "benchwright-uploads";
const s3 = new S3Client({ region: "us-east-1", endpoint: process.env.S3_ENDPOINT, forcePathStyle: true, credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } });

// Any bytes do: the clean-up never reads them. These stand for a raw photo with its metadata.
const RAW = Buffer.from("raw upload bytes with GPS 45 30 0 N, 122 40 0 W ".repeat(40));

async function exists(key: string): Promise<boolean> {
  try {
    await s3.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
    return true;
  } catch (e) {
    if ((e as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false;
    throw e;
  }
}

describe.skipIf(!enabled)("unconfirmed uploads expire", () => {
  const db = new pg.Client({ connectionString: process.env.DATABASE_URL });
  let owner: Client;
  let planId: string;

  /** Starts an upload and PUTs the raw file, without confirming it; answers the photo id and its key. */
  async function unconfirmed(): Promise<{ id: string; key: string }> {
    const start = await owner.post(`/api/v1/plans/${planId}/photos`, { wallId: "north", contentType: "image/jpeg", bytes: RAW.length });
    expect(start.status).toBe(201);
    const put = await fetch(start.body.upload.url, { method: "PUT", body: new Uint8Array(RAW), headers: start.body.upload.headers });
    expect(put.status).toBe(200);
    const id = start.body.photo.id as string;
    const row = await db.query<{ upload_key: string }>("select upload_key from wall_photo where id = $1", [id]);
    const key = row.rows[0]!.upload_key;
    expect(await exists(key)).toBe(true);
    return { id, key };
  }
  const backdate = (id: string, hours: number) => db.query(`update wall_photo set created_at = now() - make_interval(hours => $2) where id = $1`, [id, hours]);
  const rowCount = async (id: string) => (await db.query("select 1 from wall_photo where id = $1", [id])).rowCount;

  beforeAll(async () => {
    await db.connect();
    owner = (await newMember("expiry")).client;
    const r = await owner.post("/api/v1/plans", { name: "Expiring uploads", document: sampleDoc() });
    expect(r.status).toBe(201);
    planId = r.body.plan.id;
  });
  afterAll(async () => {
    await db.end();
  });

  it("the scheduled clean-up removes an upload older than the limit, object and row, and keeps a younger one", { timeout: 60_000 }, async () => {
    const old = await unconfirmed();
    const young = await unconfirmed();
    const nearly = await unconfirmed();
    await backdate(old.id, 25);
    await backdate(nearly.id, 23);

    // Run the job now (the schedule would run it within the hour) through the app's own queue.
    const boss = new PgBoss({ connectionString: process.env.DATABASE_URL, schema: "pgboss", supervise: false, schedule: false, migrate: false, max: 1 });
    boss.on("error", () => undefined);
    await boss.start();
    try {
      await boss.send("upload-cleanup", {});
    } finally {
      await boss.stop({ graceful: false, wait: true });
    }
    const end = Date.now() + 30_000;
    while ((await rowCount(old.id)) && Date.now() < end) await new Promise((r) => setTimeout(r, 250));

    expect(await rowCount(old.id)).toBe(0);
    expect(await exists(old.key)).toBe(false);
    for (const kept of [young, nearly]) {
      expect(await rowCount(kept.id)).toBe(1);
      expect(await exists(kept.key)).toBe(true);
    }
  });

  it("refuses to confirm an upload past the limit and removes it at once", async () => {
    const late = await unconfirmed();
    await backdate(late.id, 25);
    const r = await owner.post(`/api/v1/plans/${planId}/photos/${late.id}/confirm`);
    expect(r.status).toBe(422);
    expect(r.body.error.message).toMatch(/waited too long/);
    expect(await rowCount(late.id)).toBe(0);
    expect(await exists(late.key)).toBe(false);
  });
});
