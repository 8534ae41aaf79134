import "server-only";
import type { Knex } from "knex";
import { keyFigureColumns } from "@/lib/comparisons/keyFigures";
import { type ComparisonInput, comparisonInputSchema } from "@/lib/comparisons/schema";
import type { ComparisonRow, ComparisonShareRow } from "@/lib/platform/db/types";
import { InvalidError, NotFoundError } from "@/lib/platform/errors";
import { findVehicle } from "../garage/queries";
import type { ComparisonSort } from "@/lib/comparisons/savedSchema";
import {
  type ComparisonRowWithShare,
  type ComparisonShare,
  type SavedComparison,
  type SharedComparison,
  comparisonShareDto,
  savedComparisonDto,
  sharedComparisonDto,
} from "@/lib/comparisons/api";
import { bindAppDb } from "@/lib/platform/db/bind";
import { containsPattern } from "@/lib/platform/search/normalize";
import { randomToken } from "@/lib/platform/tokens";

/**
 * Saved comparisons and share links. Every function taking an `ownerId` scopes by it: another
 * owner's comparison is "not found" — `undefined` from find*, NotFoundError from the others
 * (lib/platform/errors.ts) — never an error that tells it exists.
 */

const NOT_FOUND = "That comparison";

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

export async function listComparisons(
  db: Knex,
  ownerId: string,
  opts: { q?: string; sort?: ComparisonSort; limit?: number } = {},
): Promise<SavedComparison[]> {
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
  const rows = (await q.limit(opts.limit ?? 500)) as ComparisonRowWithShare[];
  return rows.map(savedComparisonDto);
}

/** The owner's comparison, or undefined. */
export async function findComparison(db: Knex, ownerId: string, id: string): Promise<SavedComparison | undefined> {
  const row = (await withShare(db).where({ "c.id": id, "c.owner_id": ownerId }).first()) as ComparisonRowWithShare | undefined;
  return row ? savedComparisonDto(row) : undefined;
}

/** The owner's comparison; NotFoundError when it is not theirs. */
export async function getComparison(db: Knex, ownerId: string, id: string): Promise<SavedComparison> {
  const comparison = await findComparison(db, ownerId, id);
  if (!comparison) throw new NotFoundError(NOT_FOUND);
  return comparison;
}

/** A comparison may only be tied to one of the owner's own garage vehicles. */
async function assertOwnVehicle(db: Knex, ownerId: string, vehicleId: string | null | undefined): Promise<void> {
  if (!vehicleId) return;
  if (!(await findVehicle(db, ownerId, vehicleId))) {
    throw InvalidError.fields({ vehicleId: ["That vehicle is not in your garage."] });
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
    .insert({
      owner_id: ownerId,
      name: data.name.trim(),
      input: JSON.stringify(input) as unknown,
      vehicle_id: data.vehicleId ?? null,
      ...keyFigureColumns(input),
    })
    .returning("*");
  return savedComparisonDto({ ...(row as ComparisonRow), share_slug: null, share_created_at: null });
}

export async function updateComparison(
  db: Knex,
  ownerId: string,
  id: string,
  patch: { name?: string; input?: ComparisonInput; vehicleId?: string | null },
): Promise<SavedComparison> {
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
  if (n === 0) throw new NotFoundError(NOT_FOUND);
  return getComparison(db, ownerId, id);
}

/** Deletes a comparison (and its share links); returns the slug that was live, if any. */
export async function deleteComparison(db: Knex, ownerId: string, id: string): Promise<{ liveSlug: string | null }> {
  return db.transaction(async (trx) => {
    const row = await trx("comparisons").where({ id, owner_id: ownerId }).forUpdate().first("id");
    if (!row) throw new NotFoundError(NOT_FOUND);
    const live = await trx<ComparisonShareRow>("comparison_shares").where({ comparison_id: id }).whereNull("revoked_at").first("slug");
    await trx("comparisons").where({ id }).del();
    return { liveSlug: live?.slug ?? null };
  });
}

/** A copy named "<name> (copy)" without its share link. */
export async function duplicateComparison(db: Knex, ownerId: string, id: string): Promise<SavedComparison> {
  const source = await db<ComparisonRow>("comparisons").where({ id, owner_id: ownerId }).first();
  if (!source) throw new NotFoundError(NOT_FOUND);
  const suffix = " (copy)";
  const name =
    source.name.length + suffix.length > 120 ? `${source.name.slice(0, 120 - suffix.length)}${suffix}` : `${source.name}${suffix}`;
  return createComparison(db, ownerId, { name, input: source.input as ComparisonInput, vehicleId: source.vehicle_id });
}

/** 18 bytes from the operating system's CSPRNG: 144 bits, 24 URL-safe characters. */
export function newShareSlug(): string {
  return randomToken(18);
}

/**
 * Inside a transaction: locks the owner's comparison and revokes its live link. Returns the
 * revoked slug (null when none was live); NotFoundError when the comparison is not the owner's.
 */
async function revokeLive(trx: Knex.Transaction, ownerId: string, id: string): Promise<string | null> {
  const row = await trx("comparisons").where({ id, owner_id: ownerId }).forUpdate().first("id");
  if (!row) throw new NotFoundError(NOT_FOUND);
  const [old] = await trx<ComparisonShareRow>("comparison_shares")
    .where({ comparison_id: id })
    .whereNull("revoked_at")
    .update({ revoked_at: trx.fn.now() as unknown as Date })
    .returning("slug");
  return old?.slug ?? null;
}

/**
 * Makes a new public link; a live one is revoked first (its slug stays dead). Returns the new
 * link and the slug it replaced; NotFoundError when the comparison is not the owner's.
 */
export async function createShare(db: Knex, ownerId: string, id: string): Promise<ComparisonShare & { replaced: string | null }> {
  return db.transaction(async (trx) => {
    const replaced = await revokeLive(trx, ownerId, id);
    const [share] = await trx<ComparisonShareRow>("comparison_shares")
      .insert({ comparison_id: id, slug: newShareSlug() })
      .returning(["slug", "created_at"]);
    return { ...comparisonShareDto(share!), replaced };
  });
}

/** Revokes the live link; returns its slug (null when there was none); NotFoundError when not the owner's. */
export async function revokeShare(db: Knex, ownerId: string, id: string): Promise<{ revoked: string | null }> {
  return db.transaction(async (trx) => ({ revoked: await revokeLive(trx, ownerId, id) }));
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
    { slug: string; shared_at: Date; name: string; input: unknown; updated_at: Date } | undefined;
  if (!row) return undefined;
  const parsed = comparisonInputSchema.safeParse(row.input);
  if (!parsed.success) {
    console.error(`share ${slug.slice(0, 4)}…: stored comparison no longer passes the schema`);
    return undefined;
  }
  return sharedComparisonDto(row, parsed.data);
}

/** These queries on the app's database handle, for pages and route handlers. */
export const comparisonQueries = bindAppDb({
  createComparison,
  createShare,
  deleteComparison,
  duplicateComparison,
  findComparison,
  findSharedComparison,
  getComparison,
  listComparisons,
  revokeShare,
  updateComparison,
});
