import "server-only";
import type { Knex } from "knex";
import { keyFigureColumns } from "@/lib/comparisons/keyFigures";
import { type ComparisonInput, checkComparison, comparisonInputSchema } from "@/lib/comparisons/schema";
import type { ComparisonRow, ComparisonShareRow } from "@/lib/platform/db/types";
import { HttpError } from "@/lib/platform/http/errors";
import { findVehicle } from "../garage/queries";
import type { ComparisonFigures, ComparisonSort, SavedComparison } from "@/lib/comparisons/savedSchema";
import { bindAppDb } from "@/lib/platform/db/bind";
import { containsPattern } from "@/lib/platform/search/normalize";
import { randomToken } from "@/lib/platform/tokens";

/**
 * Saved comparisons and share links. Every function taking an `ownerId` scopes by it: another
 * owner's comparison is "not found" (undefined), never an error that tells it exists.
 */

type RowWithShare = ComparisonRow & { share_slug: string | null; share_created_at: Date | null };

function figuresOf(row: ComparisonRow): ComparisonFigures {
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

function toSaved(row: RowWithShare): SavedComparison {
  // Read through the model: an input saved before a field existed gets it as not entered (the
  // crawl-ratio gears), so every screen sees a whole input. One the rules no longer accept is
  // passed on as stored, as before.
  const checked = checkComparison(row.input);
  return {
    id: row.id,
    name: row.name,
    vehicleId: row.vehicle_id,
    input: checked.ok ? checked.value : (row.input as ComparisonInput),
    figures: figuresOf(row),
    share: row.share_slug ? { slug: row.share_slug, createdAt: new Date(row.share_created_at!).toISOString() } : null,
    createdAt: new Date(row.created_at).toISOString(),
    updatedAt: new Date(row.updated_at).toISOString(),
  };
}

/** Comparisons with their live share link (one query). */
function withShare(db: Knex) {
  return db("comparisons as c")
    .leftJoin("comparison_shares as s", (j) => j.on("s.comparison_id", "c.id").andOnNull("s.revoked_at"))
    .select("c.*", "s.slug as share_slug", "s.created_at as share_created_at");
}

const SORTS: Record<ComparisonSort, [string, "asc" | "desc"][]> = {
  updated: [["c.updated_at", "desc"]],
  created: [["c.created_at", "desc"]],
  name: [["c.name", "asc"]],
  diameter: [["c.diameter_change_mm", "desc"]],
};

export async function listComparisons(db: Knex, ownerId: string, opts: { q?: string; sort?: ComparisonSort; limit?: number } = {}): Promise<SavedComparison[]> {
  const q = withShare(db).where("c.owner_id", ownerId);
  const search = opts.q?.trim();
  if (search) {
    const like = containsPattern(search);
    q.where((w) => w.whereILike("c.name", like).orWhereILike("c.current_tire", like).orWhereILike("c.planned_tire", like));
  }
  for (const [col, dir] of SORTS[opts.sort ?? "updated"]) {
    if (col === "c.name") q.orderByRaw("lower(c.name) asc");
    else q.orderBy(col, dir);
  }
  q.orderBy("c.id", "asc");
  const rows = (await q.limit(opts.limit ?? 500)) as RowWithShare[];
  return rows.map(toSaved);
}

export async function getComparison(db: Knex, ownerId: string, id: string): Promise<SavedComparison | undefined> {
  const row = (await withShare(db).where({ "c.id": id, "c.owner_id": ownerId }).first()) as RowWithShare | undefined;
  return row ? toSaved(row) : undefined;
}

/** A comparison may only be tied to one of the owner's own garage vehicles. */
async function assertOwnVehicle(db: Knex, ownerId: string, vehicleId: string | null | undefined): Promise<void> {
  if (!vehicleId) return;
  if (!(await findVehicle(db, ownerId, vehicleId))) {
    throw new HttpError(422, "Some fields need attention.", { vehicleId: ["That vehicle is not in your garage."] });
  }
}

export async function createComparison(
  db: Knex,
  ownerId: string,
  data: { name: string; input: ComparisonInput; vehicleId?: string | null },
): Promise<SavedComparison> {
  const input = comparisonInputSchema.parse(data.input);
  await assertOwnVehicle(db, ownerId, data.vehicleId);
  const [row] = await db<ComparisonRow>("comparisons")
    .insert({ owner_id: ownerId, name: data.name.trim(), input: JSON.stringify(input) as unknown, vehicle_id: data.vehicleId ?? null, ...keyFigureColumns(input) })
    .returning("*");
  return toSaved({ ...(row as ComparisonRow), share_slug: null, share_created_at: null });
}

export async function updateComparison(
  db: Knex,
  ownerId: string,
  id: string,
  patch: { name?: string; input?: ComparisonInput; vehicleId?: string | null },
): Promise<SavedComparison | undefined> {
  const changes: Record<string, unknown> = { updated_at: db.fn.now() };
  if (patch.name !== undefined) changes.name = patch.name.trim();
  if (patch.vehicleId !== undefined) {
    await assertOwnVehicle(db, ownerId, patch.vehicleId);
    changes.vehicle_id = patch.vehicleId;
  }
  if (patch.input !== undefined) {
    const input = comparisonInputSchema.parse(patch.input);
    Object.assign(changes, { input: JSON.stringify(input), ...keyFigureColumns(input) });
  }
  const n = await db("comparisons").where({ id, owner_id: ownerId }).update(changes);
  if (n === 0) return undefined;
  return getComparison(db, ownerId, id);
}

/** Deletes a comparison (and its share links); returns the slug that was live, if any, or undefined when not found. */
export async function deleteComparison(db: Knex, ownerId: string, id: string): Promise<{ liveSlug: string | null } | undefined> {
  return db.transaction(async (trx) => {
    const row = await trx("comparisons").where({ id, owner_id: ownerId }).forUpdate().first("id");
    if (!row) return undefined;
    const live = await trx<ComparisonShareRow>("comparison_shares").where({ comparison_id: id }).whereNull("revoked_at").first("slug");
    await trx("comparisons").where({ id }).del();
    return { liveSlug: live?.slug ?? null };
  });
}

/** A copy named "<name> (copy)" without its share link. */
export async function duplicateComparison(db: Knex, ownerId: string, id: string): Promise<SavedComparison | undefined> {
  const source = await db<ComparisonRow>("comparisons").where({ id, owner_id: ownerId }).first();
  if (!source) return undefined;
  const suffix = " (copy)";
  const name = source.name.length + suffix.length > 120 ? `${source.name.slice(0, 120 - suffix.length)}${suffix}` : `${source.name}${suffix}`;
  return createComparison(db, ownerId, { name, input: source.input as ComparisonInput, vehicleId: source.vehicle_id });
}

/** 18 bytes from the operating system's CSPRNG: 144 bits, 24 URL-safe characters. */
export function newShareSlug(): string {
  return randomToken(18);
}

/**
 * Inside a transaction: locks the owner's comparison and revokes its live link. Returns the
 * revoked slug (null when none was live), or undefined when the comparison is not the owner's.
 */
async function revokeLive(trx: Knex.Transaction, ownerId: string, id: string): Promise<string | null | undefined> {
  const row = await trx("comparisons").where({ id, owner_id: ownerId }).forUpdate().first("id");
  if (!row) return undefined;
  const [old] = await trx<ComparisonShareRow>("comparison_shares")
    .where({ comparison_id: id })
    .whereNull("revoked_at")
    .update({ revoked_at: trx.fn.now() as unknown as Date })
    .returning("slug");
  return old?.slug ?? null;
}

/**
 * Makes a new public link; a live one is revoked first (its slug stays dead). Returns the new
 * slug and the one it replaced, or undefined when the comparison is not the owner's.
 */
export async function createShare(db: Knex, ownerId: string, id: string): Promise<{ slug: string; createdAt: string; replaced: string | null } | undefined> {
  return db.transaction(async (trx) => {
    const replaced = await revokeLive(trx, ownerId, id);
    if (replaced === undefined) return undefined;
    const [share] = await trx<ComparisonShareRow>("comparison_shares").insert({ comparison_id: id, slug: newShareSlug() }).returning(["slug", "created_at"]);
    return { slug: share!.slug, createdAt: new Date(share!.created_at).toISOString(), replaced };
  });
}

/** Revokes the live link; returns its slug (null when there was none), or undefined when not the owner's. */
export async function revokeShare(db: Knex, ownerId: string, id: string): Promise<{ revoked: string | null } | undefined> {
  return db.transaction(async (trx) => {
    const revoked = await revokeLive(trx, ownerId, id);
    return revoked === undefined ? undefined : { revoked };
  });
}

/** What a public share page shows: no owner details beyond the comparison itself. */
export interface SharedComparison {
  slug: string;
  name: string;
  input: ComparisonInput;
  sharedAt: string;
  updatedAt: string;
}

/**
 * The comparison behind a live share link, in one query; undefined for an unknown or revoked
 * slug (and for a stored input the current schema no longer accepts, which is logged).
 */
export async function findSharedComparison(db: Knex, slug: string): Promise<SharedComparison | undefined> {
  const row = (await db("comparison_shares as s")
    .join("comparisons as c", "c.id", "s.comparison_id")
    .where("s.slug", slug)
    .whereNull("s.revoked_at")
    .first("s.slug", "s.created_at as shared_at", "c.name", "c.input", "c.updated_at")) as
    | { slug: string; shared_at: Date; name: string; input: unknown; updated_at: Date }
    | undefined;
  if (!row) return undefined;
  const parsed = comparisonInputSchema.safeParse(row.input);
  if (!parsed.success) {
    console.error(`share ${slug.slice(0, 4)}…: stored comparison no longer passes the schema`);
    return undefined;
  }
  return { slug: row.slug, name: row.name, input: parsed.data, sharedAt: new Date(row.shared_at).toISOString(), updatedAt: new Date(row.updated_at).toISOString() };
}

/** These queries on the app's database handle, for pages and route handlers. */
export const comparisonQueries = bindAppDb({ createComparison, createShare, deleteComparison, duplicateComparison, findSharedComparison, getComparison, listComparisons, revokeShare, updateComparison });
