import type { EntityManager } from "@mikro-orm/postgresql";
import type { User } from "@/entities/User";
import { DEFAULT_PRICE_LIST } from "@/lib/engine/shopping/default-prices";
import { env } from "../env";
import { PacketCache, packetKey } from "../packet/cache";
import { packetInWorker } from "../packet/pool";
import type { PacketInput } from "../packet/types";
import { presetOfDocument } from "./plan-preset";
import { getPlan } from "./plans";
import { getPriceList } from "./prices";
import { openShared } from "./share-links";

export interface PacketFile {
  filename: string;
  pdf: Buffer;
  /** Names the packet's inputs: the same tag means the same file. */
  tag: string;
  /** Served from the finished packets without building it again. */
  cached: boolean;
}

const g = globalThis as unknown as { __bwPacketCache?: PacketCache };
const cache = () => (g.__bwPacketCache ??= new PacketCache());

/** A file name from the plan's name: "two-car-garage-shop-packet.pdf". */
export const packetFilename = (name: string) => `${name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "plan"}-packet.pdf`;

const link = (path: string) => new URL(path, env().APP_URL).toString();

/** Builds the packet for these inputs, or finds it finished (the plan is unchanged since it was last built). */
async function packetFor(input: PacketInput, opts: { signal?: AbortSignal }): Promise<PacketFile> {
  const tag = packetKey(input);
  const cached = cache().has(tag);
  const pdf = await cache().get(tag, () => packetInWorker(input, { signal: opts.signal }));
  return { filename: packetFilename(input.name), pdf, tag, cached };
}

/** The build packet of a plan the user may read (viewer or better), priced with the reader's own price list. */
export async function planPacket(em: EntityManager, user: User, planId: string, opts: { signal?: AbortSignal } = {}): Promise<PacketFile> {
  const plan = await getPlan(em, user, planId);
  const preset = await presetOfDocument(em, plan.document, { viewer: user });
  const prices = await getPriceList(em, user);
  return packetFor(
    {
      doc: plan.document,
      name: plan.name,
      ownerName: plan.ownerName,
      revision: plan.version,
      updatedAt: plan.updatedAt,
      shopUrl: link(`/plans/${plan.id}/shop`),
      shared: false,
      preset: preset ? { name: preset.name, numbers: preset.numbers } : null,
      prices: prices.items,
    },
    opts,
  );
}

/** The build packet of a shared plan, read through its link (the example prices: the reader has no account here). */
export async function sharedPacket(em: EntityManager, token: string, opts: { signal?: AbortSignal } = {}): Promise<PacketFile> {
  const plan = await openShared(em, token, { record: false });
  const preset = await presetOfDocument(em, plan.document);
  return packetFor(
    {
      doc: plan.document,
      name: plan.name,
      ownerName: plan.ownerName,
      revision: plan.version,
      updatedAt: plan.updatedAt,
      shopUrl: link(`/s/${token}/shop`),
      shared: true,
      preset: preset ? { name: preset.name, numbers: preset.numbers } : null,
      prices: DEFAULT_PRICE_LIST.items,
    },
    opts,
  );
}
