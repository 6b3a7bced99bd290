/**
 * Saves under contention, against the real server and PostgreSQL: optimistic locking holds when
 * many saves race on one plan (one statement locks the row, writes the document and copies the
 * replaced one into the history), every accepted save is in the history, and nothing else is.
 */
import { describe, it, expect, beforeAll } from "vitest";
import { type Client, hasServer, newMember, type Res } from "./helpers/client";

const doc = (wallMm: number) => ({
  schemaVersion: 1,
  room: { walls: [{ id: "a", lengthMm: wallMm }, { id: "b", lengthMm: 5000 }, { id: "c", lengthMm: wallMm }, { id: "d", lengthMm: 5000 }] },
});

interface Revision {
  id: string;
  version: number;
}

const wallOf = (r: Res) => r.body.plan.document.room.walls[0].lengthMm as number;

describe.skipIf(!hasServer)("plan saves under contention", () => {
  let owner: Client;
  beforeAll(async () => {
    owner = (await newMember("racer")).client;
  });

  async function history(id: string): Promise<Map<number, number>> {
    const revs = await owner.get(`/api/v1/plans/${id}/revisions`);
    expect(revs.status).toBe(200);
    const out = new Map<number, number>();
    for (const r of revs.body.revisions as Revision[]) {
      const one = await owner.get(`/api/v1/plans/${id}/revisions/${r.id}`);
      expect(one.status).toBe(200);
      out.set(r.version, one.body.revision.document.room.walls[0].lengthMm);
    }
    return out;
  }

  it("50 saves at the same version at once: one is accepted, 49 answer 409 and leave nothing", async () => {
    const id = (await owner.post("/api/v1/plans", { name: "Fifty at once", document: doc(6000) })).body.plan.id as string;
    const answers = await Promise.all(Array.from({ length: 50 }, (_, i) => owner.put(`/api/v1/plans/${id}`, { document: doc(7000 + i), version: 1 })));
    const statuses = answers.map((a) => a.status);
    expect(statuses.filter((s) => s >= 500)).toEqual([]);
    const accepted = answers.filter((a) => a.status === 200);
    expect(accepted).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    for (const a of answers.filter((x) => x.status === 409)) {
      expect(a.body.error.code).toBe("stale_version");
      expect(a.body.error.currentVersion).toBe(2);
    }
    expect(accepted[0].body.plan.version).toBe(2);

    const now = await owner.get(`/api/v1/plans/${id}`);
    expect(now.body.plan.version).toBe(2);
    expect(wallOf(now)).toBe(wallOf(accepted[0]));
    // Only the replaced first document is in the history: no 409 wrote anything.
    expect([...(await history(id))]).toEqual([[1, 6000]]);
  });

  it("50 writers retrying on 409: every accepted save is in the history at its version, nothing else", async () => {
    const id = (await owner.post("/api/v1/plans", { name: "Fifty writers", document: doc(6000) })).body.plan.id as string;
    const accepted = new Map<number, number>();
    let conflicts = 0;
    const writer = async (w: number) => {
      let version = 1;
      for (let attempt = 0; attempt < 3; attempt++) {
        const wall = 7000 + w * 10 + attempt;
        const r = await owner.put(`/api/v1/plans/${id}`, { document: doc(wall), version });
        expect(r.status === 200 || r.status === 409, `status ${r.status}`).toBe(true);
        if (r.status === 200) {
          expect(accepted.has(r.body.plan.version)).toBe(false);
          accepted.set(r.body.plan.version, wall);
          expect(wallOf(r)).toBe(wall);
          return;
        }
        conflicts++;
        version = r.body.error.currentVersion;
      }
    };
    await Promise.all(Array.from({ length: 50 }, (_, w) => writer(w)));
    expect(accepted.size).toBeGreaterThan(0);
    const now = await owner.get(`/api/v1/plans/${id}`);
    const final = now.body.plan.version as number;
    // Versions are contiguous: one accepted save each, none lost, none doubled.
    expect(final).toBe(accepted.size + 1);
    expect([...accepted.keys()].sort((a, b) => a - b)).toEqual(Array.from({ length: accepted.size }, (_, i) => i + 2));
    expect(wallOf(now)).toBe(accepted.get(final));
    // History: version 1 is the created document, version v the save accepted as v.
    const hist = await history(id);
    expect(hist.size).toBe(final - 1);
    expect(hist.get(1)).toBe(6000);
    for (let v = 2; v < final; v++) expect(hist.get(v), `revision ${v}`).toBe(accepted.get(v));
    expect(accepted.size + conflicts).toBeGreaterThanOrEqual(50);
  });

  it("a stale save keeps the newer document, name and history", async () => {
    const id = (await owner.post("/api/v1/plans", { name: "Newer wins", document: doc(6000) })).body.plan.id as string;
    const newer = await owner.put(`/api/v1/plans/${id}`, { document: doc(6100), version: 1, name: "Newer wins, v2" });
    expect(newer.status).toBe(200);
    expect(newer.body.plan.name).toBe("Newer wins, v2");
    const stale = await owner.put(`/api/v1/plans/${id}`, { document: doc(9000), version: 1, name: "Stale name" });
    expect(stale.status).toBe(409);
    expect(stale.body.error.currentVersion).toBe(2);
    const ahead = await owner.put(`/api/v1/plans/${id}`, { document: doc(9000), version: 3 });
    expect(ahead.status).toBe(409);
    const now = await owner.get(`/api/v1/plans/${id}`);
    expect(now.body.plan.version).toBe(2);
    expect(now.body.plan.name).toBe("Newer wins, v2");
    expect(wallOf(now)).toBe(6100);
    expect([...(await history(id))]).toEqual([[1, 6000]]);
  });

  it("a save answers with the stored plan: new version, later updatedAt, filled-in document, the owner's name", async () => {
    const created = await owner.post("/api/v1/plans", { name: "Answer shape", document: doc(6000) });
    const id = created.body.plan.id as string;
    const saved = await owner.put(`/api/v1/plans/${id}`, { document: doc(6050), version: 1 });
    expect(saved.status).toBe(200);
    const p = saved.body.plan;
    expect(p).toMatchObject({ id, name: "Answer shape", version: 2, role: "owner", ownerName: created.body.plan.ownerName, deletedAt: null, createdAt: created.body.plan.createdAt });
    expect(Date.parse(p.updatedAt)).toBeGreaterThanOrEqual(Date.parse(created.body.plan.updatedAt));
    expect(p.document.settings.units).toBe("in");
    const read = await owner.get(`/api/v1/plans/${id}`);
    expect(read.body.plan).toEqual(p);
  });

  it("a deleted plan and a malformed document are not saved", async () => {
    const id = (await owner.post("/api/v1/plans", { name: "Gone", document: doc(6000) })).body.plan.id as string;
    const bad = await owner.put(`/api/v1/plans/${id}`, { document: doc(-1), version: 1 });
    expect(bad.status).toBe(422);
    expect((await owner.get(`/api/v1/plans/${id}`)).body.plan.version).toBe(1);
    expect((await owner.del(`/api/v1/plans/${id}`)).status).toBe(200);
    expect((await owner.put(`/api/v1/plans/${id}`, { document: doc(6100), version: 1 })).status).toBe(404);
    expect((await owner.post(`/api/v1/plans/${id}/restore`)).status).toBe(200);
    const back = await owner.get(`/api/v1/plans/${id}`);
    expect(back.body.plan.version).toBe(1);
    expect(wallOf(back)).toBe(6000);
  });
});
