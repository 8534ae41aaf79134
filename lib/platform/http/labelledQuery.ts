import "server-only";
import type { NextRequest } from "next/server";
import type { z } from "zod";
import { type FieldLabels, labelledMessage } from "@/lib/platform/validation/labels";
import { HttpError } from "./errors";
import { fieldErrorsOf } from "./route";

/**
 * Parses a handler's query string like route({ query }) does (400 with field errors), but the
 * message names the field as the screen labels it, for screens that show only the message (a
 * search box). Call it inside the handler, after route() has checked the caller.
 *
 * @example
 * const { q } = parseLabelledQuery(customerSearchSchema, req, { q: "Phone, e-mail or name" });
 */
export function parseLabelledQuery<T extends z.ZodType>(schema: T, req: NextRequest, labels: FieldLabels): z.infer<T> {
  const result = schema.safeParse(Object.fromEntries(req.nextUrl.searchParams));
  if (result.success) return result.data;
  const fieldErrors = fieldErrorsOf(result.error);
  throw new HttpError(400, labelledMessage(fieldErrors, labels) ?? "Some fields need attention.", fieldErrors);
}
