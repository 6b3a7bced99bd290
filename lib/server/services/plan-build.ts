import type { EntityManager } from "@mikro-orm/postgresql";
import type { User } from "@/entities/User";
import type { BuildResult } from "@/lib/engine/build";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { buildInWorker } from "../engine-pool/engine";
import { getPlan } from "./plans";
import { openShared } from "./share-links";

/** What the build endpoints answer: the plan's units (to write lengths the way its owner does) and the build result, mm. */
export interface PlanBuildAnswer {
  units: PlanDocument["settings"]["units"];
  precision: PlanDocument["settings"]["precision"];
  build: BuildResult;
}

async function answer(doc: PlanDocument, signal?: AbortSignal): Promise<PlanBuildAnswer> {
  return { units: doc.settings.units, precision: doc.settings.precision, build: await buildInWorker(doc, { signal }) };
}

/** The labelled cut list, setups, stop tables and build steps of a plan (viewer access or better; in the worker pool). */
export async function planBuild(em: EntityManager, user: User, planId: string, opts: { signal?: AbortSignal } = {}): Promise<PlanBuildAnswer> {
  const plan = await getPlan(em, user, planId);
  return answer(plan.document, opts.signal);
}

/** The same for a live share link (revoked, expired or unknown: 404); reading it does not count as opening the link. */
export async function sharedBuild(em: EntityManager, token: string, opts: { signal?: AbortSignal } = {}): Promise<PlanBuildAnswer> {
  const plan = await openShared(em, token, { record: false });
  return answer(plan.document, opts.signal);
}
