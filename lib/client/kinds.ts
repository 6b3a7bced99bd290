import type { FixtureKind } from "@/lib/engine/fixtures/types";
import { baseCabinet } from "@/lib/engine/fixtures/base-cabinet";
import { stopTrack } from "@/lib/engine/fixtures/stop-track";
import { toolShelf } from "@/lib/engine/fixtures/tool-shelf";

/**
 * The fixture kinds the editor offers, until the engine's registry is exported; then this file
 * re-exports it.
 */
export const editorKinds: readonly FixtureKind<unknown>[] = [baseCabinet, toolShelf, stopTrack] as unknown as FixtureKind<unknown>[];

export function kindOf(kind: string): FixtureKind<unknown> | undefined {
  return editorKinds.find((k) => k.kind === kind);
}
