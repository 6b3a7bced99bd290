import type { EntityManager } from "@mikro-orm/postgresql";
import type { User } from "@/entities/User";
import { notFound } from "../errors";
import { drawingFileInWorker } from "../packet/drawings-pool";
import type { DrawingFileInput } from "../packet/drawing-file";
import { getPlan } from "./plans";

const slug = (name: string) => name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase();

/** The plan view or a wall elevation of a plan the user may read, as an SVG file with a file name; 404 when there is no such drawing. */
export async function planDrawingFile(em: EntityManager, user: User, planId: string, which: DrawingFileInput["which"], opts: { signal?: AbortSignal } = {}): Promise<{ filename: string; svg: string }> {
  const plan = await getPlan(em, user, planId);
  const file = await drawingFileInWorker({ doc: plan.document, which }, opts);
  if (!file) throw notFound(which.kind === "plan" ? "That drawing" : "That wall");
  return { filename: `${slug(plan.name) || "plan"}-${slug(file.name) || "drawing"}.svg`, svg: file.svg };
}
