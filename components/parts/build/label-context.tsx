"use client";

import { createContext, useContext } from "react";

/** The plan's part labels and the one a person clicked, shared by the parts list, sheet maps, board plan and build view. */
export interface LabelState {
  /** Part id to label ("cab-1:side" to "A3"). */
  labelOf: Readonly<Record<string, string>>;
  selected: string | null;
  select: (label: string | null) => void;
}

const NONE: LabelState = { labelOf: {}, selected: null, select: () => undefined };

export const LabelContext = createContext<LabelState>(NONE);

/** Labels and the selected one; outside a provider there are none. */
export function useLabels(): LabelState {
  return useContext(LabelContext);
}
