/** Says plainly whether the page is online, when it last synced and how many check-offs wait. */
export function SyncStatus({ online, waiting, lastSynced, problem, shared, offlineReady }: { online: boolean; waiting: number; lastSynced: string | null; problem: string | null; shared: boolean; offlineReady: boolean }) {
  const when = lastSynced ? new Date(lastSynced).toLocaleTimeString([], { hour: "numeric", minute: "2-digit" }) : null;
  const tone = !online ? "border-steel-500 bg-steel-100 text-steel-700" : waiting > 0 ? "border-amberline-500 bg-amberline-100 text-walnut-900" : "border-pine-500 bg-pine-100 text-pine-700";
  return (
    <div className={`rounded-lg border-2 px-3 py-2 text-base ${tone}`} role="status" aria-live="polite" data-testid="sync-status">
      <p className="font-semibold">
        {online ? "Online" : "Offline"}
        {shared ? " · your check-offs stay on this phone" : waiting > 0 ? ` · ${waiting} check-off${waiting === 1 ? "" : "s"} waiting to sync` : " · all check-offs synced"}
      </p>
      <p className="text-sm">
        {when ? `Last synced ${when}` : "Not synced yet"}
        {offlineReady ? " · saved for use without a network" : ""}
      </p>
      {problem && <p className="mt-1 text-sm font-semibold text-brick-700">{problem}</p>}
    </div>
  );
}
