"use client";

import { useState, type DragEvent } from "react";
import { issuePathInWords } from "@/lib/engine/plan/issue-words";
import { parsePlan } from "@/lib/engine/plan/parse";

/** Largest file the import route takes, bytes (its body limit). */
export const IMPORT_MAX_BYTES = 5_000_000;

type Preview = { file: { format: "benchwright-plan"; name: string; document: unknown }; name: string; walls: number; fixtures: number };
type State = { kind: "empty" } | { kind: "preview"; preview: Preview } | { kind: "problem"; lines: string[] } | { kind: "sending"; preview: Preview };

/** Reads a chosen file into a preview, or into messages a person can act on. */
async function readPlanFile(f: File): Promise<State> {
  if (f.size > IMPORT_MAX_BYTES) return { kind: "problem", lines: [`This file is ${(f.size / 1e6).toFixed(1)} MB; a plan file can be at most ${IMPORT_MAX_BYTES / 1e6} MB.`] };
  let raw: unknown;
  try {
    raw = JSON.parse(await f.text());
  } catch {
    return { kind: "problem", lines: ["This file is not a Benchwright plan: it is not JSON text. Choose a file made with Export plan (it ends in .benchwright.json)."] };
  }
  const obj = raw as { format?: unknown; name?: unknown; document?: unknown } | null;
  if (!obj || typeof obj !== "object" || obj.format !== "benchwright-plan" || !("document" in obj)) {
    return { kind: "problem", lines: ["This file is not a Benchwright plan: it has no plan in it. Choose a file made with Export plan."] };
  }
  const parsed = parsePlan(obj.document);
  if (!parsed.ok) {
    return {
      kind: "problem",
      lines: parsed.issues.slice(0, 12).map((i) => (i.path === "schemaVersion" ? i.message : `${issuePathInWords(i.path) || "The plan"}: ${i.message}`)).concat(parsed.issues.length > 12 ? [`and ${parsed.issues.length - 12} more problems.`] : []),
    };
  }
  const name = typeof obj.name === "string" && obj.name.trim() ? obj.name.trim().slice(0, 120) : f.name.replace(/\.benchwright\.json$|\.json$/i, "") || "Imported plan";
  return { kind: "preview", preview: { file: { format: "benchwright-plan", name, document: obj.document }, name, walls: parsed.plan.room.walls.length, fixtures: parsed.plan.fixtures.length } };
}

/** Import plan: pick or drop a plan file, see what will be created, then create it as a new plan (existing plans are never changed). */
export function ImportPlan({ onImported }: { onImported: (id: string) => void }) {
  const [state, setState] = useState<State>({ kind: "empty" });
  const [over, setOver] = useState(false);

  const take = async (f: File | undefined) => {
    if (f) setState(await readPlanFile(f));
  };
  const drop = (e: DragEvent<HTMLDivElement>) => {
    e.preventDefault();
    setOver(false);
    void take(e.dataTransfer.files[0]);
  };
  async function create(preview: Preview) {
    setState({ kind: "sending", preview });
    const res = await fetch("/api/v1/plans/import", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(preview.file) });
    const body = (await res.json().catch(() => null)) as { plan?: { id: string }; error?: { message?: string; fields?: Record<string, string> } } | null;
    if (res.ok && body?.plan) return onImported(body.plan.id);
    const fields = Object.entries(body?.error?.fields ?? {}).map(([k, v]) => `${issuePathInWords(k.replace(/^document\./, "")) || "The plan"}: ${v}`);
    setState({ kind: "problem", lines: [body?.error?.message ?? `The plan could not be imported (${res.status}).`, ...fields] });
  }

  return (
    <section aria-labelledby="import-heading" className="flex flex-col gap-2">
      <h2 id="import-heading" className="text-sm font-medium">
        Import plan
      </h2>
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={drop}
        className={`flex flex-wrap items-center gap-3 rounded-md border border-dashed px-3 py-3 text-sm ${over ? "border-walnut-700 bg-paper-deep" : "border-walnut-300"}`}
        data-testid="import-drop"
      >
        <label className="cursor-pointer rounded-md border border-walnut-300 bg-white px-3 py-1.5 font-medium text-walnut-900 hover:bg-walnut-100">
          Choose a plan file
          <input type="file" accept=".json,application/json" className="sr-only" onChange={(e) => void take(e.currentTarget.files?.[0])} data-testid="import-file" />
        </label>
        <span className="text-walnut-700">or drop a file made with Export plan here.</span>
      </div>
      {(state.kind === "preview" || state.kind === "sending") && (
        <div role="status" className="flex flex-wrap items-center gap-3 rounded-md bg-paper-deep px-3 py-2 text-sm text-walnut-900" data-testid="import-preview">
          <span>
            Will create <strong>{state.preview.name}</strong>: {state.preview.walls} walls, {state.preview.fixtures} fixtures. Your other plans stay as they are.
          </span>
          <button type="button" disabled={state.kind === "sending"} onClick={() => void create(state.preview)} className="rounded-md bg-walnut-700 px-3 py-1 font-medium text-paper disabled:opacity-60">
            {state.kind === "sending" ? "Importing…" : "Import as a new plan"}
          </button>
          <button type="button" onClick={() => setState({ kind: "empty" })} className="underline">
            Cancel
          </button>
        </div>
      )}
      {state.kind === "problem" && (
        <div role="alert" className="rounded-md bg-brick-100 px-3 py-2 text-sm text-brick-700" data-testid="import-problem">
          {state.lines.map((l, i) => (
            <p key={i}>{l}</p>
          ))}
        </div>
      )}
    </section>
  );
}
