"use client";
import { createContext, useContext } from "react";
import type { ComparisonInput } from "@/lib/comparisons/schema";

/**
 * The workspace's current comparison for controls placed in its toolbar slot (the save
 * control): the last complete input, and whether every field is valid right now.
 */
export interface CurrentInput {
  input: ComparisonInput;
  complete: boolean;
  /** The garage vehicle picked in the workspace (null: none); undefined where there is no garage (visitors). */
  vehicleId?: string | null;
  /** Tells the workspace the comparison was saved as `id`: its link names it from now on. */
  onSaved: (id: string) => void;
}

/** The saved comparison the workspace was opened from, as it was saved (to tell unsaved edits). */
export interface OpenedComparison {
  id: string;
  name: string;
  vehicleId: string | null;
  input: ComparisonInput;
}

export const CurrentInputContext = createContext<CurrentInput | null>(null);

export function useCurrentInput(): CurrentInput {
  const v = useContext(CurrentInputContext);
  if (!v) throw new Error("useCurrentInput outside the workspace");
  return v;
}
