/**
 * What the comparisons API and the share page return (camelCase, ISO dates) and the row → API
 * mappers; shared by server and client. The owner's id stays on the server.
 */
import type { ComparisonRow } from "@/lib/platform/db/types";
import { checkComparison } from "./checkInput";
import type { ComparisonInput } from "./model";

/** Key figures stored beside the input (computed on the server). */
export interface ComparisonFigures {
  currentTire: string;
  plannedTire: string;
  diameterChangeMm: number;
  groundClearanceChangeMm: number;
  pokeChangeMm: number;
  scrubChangeMm: number;
  speedometerErrorPct: number;
  suggestedRatio: number;
  warningCount: number;
}

/** A saved comparison as the API returns it. */
export interface SavedComparison {
  id: string;
  name: string;
  vehicleId: string | null;
  input: ComparisonInput;
  figures: ComparisonFigures;
  /** The live share link, if any. */
  share: { slug: string; createdAt: string } | null;
  createdAt: string;
  updatedAt: string;
}

/** A new public link, as the share route answers it. */
export interface ComparisonShare {
  slug: string;
  createdAt: string;
  /** Where the public page is: /s/<slug>. */
  path: string;
}

/** What a public share page shows: no owner details beyond the comparison itself. */
export interface SharedComparison {
  slug: string;
  name: string;
  input: ComparisonInput;
  sharedAt: string;
  updatedAt: string;
}

/** A comparison row as the list query reads it: with its live share link, if any. */
export type ComparisonRowWithShare = ComparisonRow & { share_slug: string | null; share_created_at: Date | null };

const iso = (d: Date | string) => new Date(d).toISOString();

function comparisonFiguresDto(row: ComparisonRow): ComparisonFigures {
  return {
    currentTire: row.current_tire,
    plannedTire: row.planned_tire,
    diameterChangeMm: row.diameter_change_mm,
    groundClearanceChangeMm: row.ground_clearance_change_mm,
    pokeChangeMm: row.poke_change_mm,
    scrubChangeMm: row.scrub_change_mm,
    speedometerErrorPct: row.speedometer_error_pct,
    suggestedRatio: row.suggested_ratio,
    warningCount: row.warning_count,
  };
}

/**
 * @example
 * savedComparisonDto({ id: "c", owner_id: "u", name: "Trail build", input, …, share_slug: null, share_created_at: null });
 * // { id: "c", name: "Trail build", vehicleId: null, input, figures: { … }, share: null, createdAt: "…Z", updatedAt: "…Z" }
 */
export function savedComparisonDto(row: ComparisonRowWithShare): SavedComparison {
  // Read through the model: an input saved before a field existed gets it as not entered (the
  // crawl-ratio gears), so every screen sees a whole input. One the rules no longer accept is
  // passed on as stored, as before.
  const checked = checkComparison(row.input);
  return {
    id: row.id,
    name: row.name,
    vehicleId: row.vehicle_id,
    input: checked.ok ? checked.value : (row.input as ComparisonInput),
    figures: comparisonFiguresDto(row),
    share: row.share_slug ? { slug: row.share_slug, createdAt: iso(row.share_created_at!) } : null,
    createdAt: iso(row.created_at),
    updatedAt: iso(row.updated_at),
  };
}

/** @example comparisonShareDto({ slug: "Ab…", created_at }) // { slug: "Ab…", createdAt: "…Z", path: "/s/Ab…" } */
export function comparisonShareDto(row: { slug: string; created_at: Date | string }): ComparisonShare {
  return { slug: row.slug, createdAt: iso(row.created_at), path: `/s/${row.slug}` };
}

/** A live share's row (the input already read through the schema) as the share page shows it. */
export function sharedComparisonDto(
  row: { slug: string; shared_at: Date | string; name: string; updated_at: Date | string },
  input: ComparisonInput,
): SharedComparison {
  return { slug: row.slug, name: row.name, input, sharedAt: iso(row.shared_at), updatedAt: iso(row.updated_at) };
}
