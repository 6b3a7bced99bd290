"use client";

import { useEffect, useRef, useState } from "react";

type State = { kind: "idle" } | { kind: "building"; since: number } | { kind: "ready"; url: string; filename: string } | { kind: "failed"; message: string };

const fileNameOf = (res: Response, fallback: string) => /filename="([^"]+)"/.exec(res.headers.get("content-disposition") ?? "")?.[1] ?? fallback;

/**
 * "Build packet": asks the server for the plan's build packet (a PDF), shows that it is being built
 * with the seconds so far, then hands the file to the browser as a download. Asking again while the
 * plan is unchanged gets the finished file at once.
 */
export function PacketButton({ href, className = "" }: { href: string; className?: string }) {
  const [state, setState] = useState<State>({ kind: "idle" });
  const [now, setNow] = useState(0);
  const link = useRef<HTMLAnchorElement>(null);
  const abort = useRef<AbortController | null>(null);

  useEffect(() => {
    if (state.kind !== "building") return;
    const t = setInterval(() => setNow(Date.now()), 500);
    return () => clearInterval(t);
  }, [state.kind]);
  useEffect(() => () => abort.current?.abort(), []);
  useEffect(() => {
    if (state.kind === "ready") link.current?.click();
    return () => {
      if (state.kind === "ready") URL.revokeObjectURL(state.url);
    };
  }, [state]);

  async function build() {
    abort.current?.abort();
    const ctl = new AbortController();
    abort.current = ctl;
    const since = Date.now();
    setNow(since);
    setState({ kind: "building", since });
    try {
      const res = await fetch(href, { signal: ctl.signal });
      if (!res.ok) {
        const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
        setState({ kind: "failed", message: body?.error?.message ?? `The packet could not be built (${res.status}).` });
        return;
      }
      const blob = await res.blob();
      setState({ kind: "ready", url: URL.createObjectURL(blob), filename: fileNameOf(res, "build-packet.pdf") });
    } catch (e) {
      if (!ctl.signal.aborted) setState({ kind: "failed", message: e instanceof Error ? `The packet could not be downloaded: ${e.message}` : "The packet could not be downloaded." });
    }
  }

  const busy = state.kind === "building";
  return (
    <span className="inline-flex items-center gap-2">
      <button type="button" onClick={build} disabled={busy} aria-busy={busy} className={`rounded border border-walnut-300 px-2 py-0.5 text-xs text-walnut-900 hover:bg-walnut-100 disabled:opacity-70 ${className}`} data-testid="build-packet">
        {busy ? "Building packet…" : "Build packet"}
      </button>
      <span role="status" className="text-xs text-walnut-700">
        {busy && `Laying out the drawings, sheet maps and lists: ${Math.max(0, Math.round((now - state.since) / 1000))} s`}
        {state.kind === "ready" && (
          <a ref={link} href={state.url} download={state.filename} className="underline">
            Packet ready: download again
          </a>
        )}
      </span>
      {state.kind === "failed" && (
        <span role="alert" className="text-xs text-brick-700">
          {state.message}
        </span>
      )}
    </span>
  );
}
