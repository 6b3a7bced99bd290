/** Line icons drawn for Benchwright (24 px grid, stroke 1.75). */
const paths: Record<string, string> = {
  undo: "M9 7H4v5 M4 12a8 8 0 1 0 2.3-5.7",
  redo: "M15 7h5v5 M20 12a8 8 0 1 1-2.3-5.7",
  delete: "M5 7h14 M10 7V4h4v3 M7 7l1 13h8l1-13",
  duplicate: "M8 8h11v11H8z M5 16V5h11",
  orbit: "M12 3l8 4.5v9L12 21l-8-4.5v-9z M12 12l8-4.5 M12 12v9 M12 12L4 7.5",
  plan: "M4 4h16v16H4z M4 10h7v10 M11 4v6",
  elevation: "M3 20h18 M5 20V6h14v14 M8 20v-6h3v6 M13 10h4v4h-4z",
  frame: "M4 9V4h5 M15 4h5v5 M20 15v5h-5 M9 20H4v-5",
  tape: "M3 16l13-13 5 5L8 21z M7 12l2 2 M10 9l2 2 M13 6l2 2",
  snap: "M6 4v7a6 6 0 0 0 12 0V4 M6 8h4 M14 8h4",
  help: "M12 21a9 9 0 1 0 0-18 9 9 0 0 0 0 18z M9.5 9a2.5 2.5 0 1 1 3.5 2.3c-.6.3-1 .9-1 1.6V14 M12 17.5v.5",
  select: "M5 3l13 8-6 1.5L9 19z",
  zones: "M4 4h16v16H4z M4 12l8-8 M4 20L20 4 M12 20l8-8",
};

export function Icon({ name, className = "h-5 w-5" }: { name: string; className?: string }) {
  return (
    <svg viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth={1.75} strokeLinecap="round" strokeLinejoin="round" className={className} aria-hidden="true" focusable="false">
      <path d={paths[name] ?? paths.help} />
    </svg>
  );
}

/** Catalogue pictures: simple elevations of each fixture kind, our own drawings. */
const kindPaths: Record<string, string> = {
  "base-cabinet": "M3 8h18v2H3z M4 10h16v10H4z M5 20v1 M19 20v1 M6 12h12v2H6z M6 15h12v2H6z M11 13h2 M11 16h2",
  "tool-shelf": "M2 9h5v11H2z M17 9h5v11h-5z M7 13h10v7H7z M9 10h6l-1 3h-4z M12 4a3 3 0 0 1 3 3h-6a3 3 0 0 1 3-3z",
  "stop-track": "M2 12h20v3H2z M6 9h3v3H6z M15 9h3v3h-3z M4 15v2 M20 15v2",
  workbench: "M2 9h20v3H2z M4 12v9 M20 12v9 M4 17h16",
  "wall-cabinet": "M4 3h16v10H4z M12 3v10 M10 8v1 M14 8v1 M2 20h20",
  "shelf-run": "M4 4v17 M20 4v17 M4 8h16 M4 13h16 M4 18h16",
  "cleat-wall": "M3 4h18v17H3z M3 9l4-2h14 M3 14l4-2h14 M3 19l4-2h14",
  pegboard: "M3 4h18v16H3z M7 8v.5 M12 8v.5 M17 8v.5 M7 12v.5 M12 12v.5 M17 12v.5 M7 16v.5 M12 16v.5 M17 16v.5",
  "lumber-rack": "M4 3v18 M4 7h15 M4 12h15 M4 17h15 M7 6h10 M7 11h10",
};

export function KindIcon({ kind, className = "h-8 w-8" }: { kind: string; className?: string }) {
  return (
    <svg viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth={1.5} strokeLinecap="round" strokeLinejoin="round" className={className} aria-hidden="true" focusable="false">
      <path d={kindPaths[kind] ?? "M4 6h16v12H4z M4 10h16"} />
    </svg>
  );
}
