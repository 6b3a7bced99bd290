"use client";

import dynamic from "next/dynamic";

/**
 * The parts view of a shared plan, worked out in the reader's browser only: rendered on the server,
 * its parts list, board plan and shopping list would run on the web process for every anonymous
 * reader of the link (the server's own engine work goes through its worker pool instead).
 */
export const SharedParts = dynamic(() => import("@/components/parts/PartsView").then((m) => m.PartsView), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-walnut-500">Working out the parts list…</p>,
});
