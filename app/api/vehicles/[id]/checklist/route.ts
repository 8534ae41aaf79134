import { z } from "zod";
import { db } from "@/lib/db";
import { DEFAULT_CLEARANCE_MARGIN_MM } from "@/lib/fitment";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { buildChecklist } from "@/lib/garage/checklist";
import { setupFromQuery, setupQuery } from "@/lib/garage/links";
import { HttpError, notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { findChecklist, saveChecklist, vehicleDetail } from "@/lib/server/garage";
import { checklistUpdateSchema } from "@/lib/validation/garage";

const params = z.object({ id: z.uuid() });

/** The checklist of a vehicle + planned setup (query: the planned setup as p* parameters) and its ticks. */
export const GET = route({ access: GARAGE_ACCESS, params }, async ({ caller, params, req }) => {
  const detail = await vehicleDetail(db, caller.userId, params.id);
  if (!detail) throw notFound("That vehicle");
  const planned = setupFromQuery("p", req.nextUrl.searchParams);
  if (!planned) throw new HttpError(400, "Give the planned setup as pt, pd, pw and po (or pb and pr) query parameters, e.g. ?pt=35x12.50R17LT&pd=17&pw=9&po=-12.");
  const checklist = buildChecklist({ ...detail, planned, marginMm: DEFAULT_CLEARANCE_MARGIN_MM });
  const row = await findChecklist(db, params.id, setupQuery("p", planned));
  return { items: checklist.items, ticked: row?.ticked ?? [], comparisonId: row?.comparison_id ?? null };
});

/** Saves which items are ticked. Ids must be items of this checklist. */
export const PUT = route({ access: GARAGE_ACCESS, params, body: checklistUpdateSchema }, async ({ caller, params, body }) => {
  const detail = await vehicleDetail(db, caller.userId, params.id);
  if (!detail) throw notFound("That vehicle");
  const { items } = buildChecklist({ ...detail, planned: body.planned, marginMm: DEFAULT_CLEARANCE_MARGIN_MM });
  const known = new Set(items.map((i) => i.id));
  const unknown = body.ticked.filter((t) => !known.has(t));
  if (unknown.length) throw new HttpError(422, "Some ticked items are not on this checklist.", { ticked: [`Not on this checklist: ${unknown.slice(0, 5).join(", ")}`] });
  const row = await saveChecklist(db, { vehicleId: params.id, plannedKey: setupQuery("p", body.planned), planned: body.planned, ticked: [...new Set(body.ticked)] });
  return { ticked: row.ticked };
});
