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

/**
 * `search` with one parameter set (or removed with null), the others kept as written — the
 * comparison's own encoding stays readable (no re-encoding of `/` or `,`).
 */
export function withParam(search: string, key: string, value: string | null): string {
  const kept = search.replace(/^\?/, "").split("&").filter((kv) => kv !== "" && kv.split("=")[0] !== key);
  if (value) kept.push(`${key}=${encodeURIComponent(value)}`);
  return `?${kept.join("&")}`;
}
