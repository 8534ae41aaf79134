import { z } from "zod";
import { QUOTE_STATUSES } from "@/lib/platform/db/types";
import { pagingFields } from "@/lib/platform/validation/paging";
import { STATUS_LABEL } from "./status";

/** The orders the quotes list offers, each with how the Sort control reads it. */
export const QUOTE_SORTS = {
  newest: "Newest first",
  oldest: "Oldest first",
  number: "Quote number, highest first",
  customer: "Customer, A to Z",
  total: "Total, highest first",
  validUntil: "Valid until, soonest first",
} as const;
export type QuoteSort = keyof typeof QUOTE_SORTS;

/** Rows a page of the list shows; the CSV export takes every match up to QUOTE_EXPORT_MAX. */
export const QUOTE_PAGE_SIZE = 25;
export const QUOTE_EXPORT_MAX = 10_000;

/**
 * The quotes list's search, filter, order and page, as the list's form sends them in the address
 * (a GET form: the list can be bookmarked, shared with a colleague and used without script).
 * An empty field means "any".
 *
 * @example
 * quoteListQuerySchema.parse({ q: "Q-1042", status: "sent", page: "2" });
 * // { q: "Q-1042", status: "sent", sort: "newest", page: 2 }
 */
export const quoteListQuerySchema = z.object({
  q: z.string().trim().max(100, "Use at most 100 characters.").optional(),
  status: z.union([z.enum(QUOTE_STATUSES), z.literal("").transform(() => undefined)], "Pick one of the statuses in the list.").optional(),
  sort: z
    .union(
      [z.enum(Object.keys(QUOTE_SORTS) as [QuoteSort, ...QuoteSort[]]), z.literal("").transform(() => undefined)],
      "Pick one of the orders in the list.",
    )
    .optional()
    .transform((s): QuoteSort => s ?? "newest"),
  ...pagingFields(200),
});
export type QuoteListQuery = z.infer<typeof quoteListQuerySchema>;

/** What the list's form calls each control, so a refused query names it. */
export const QUOTE_LIST_LABELS = {
  q: "Search",
  status: "Status",
  sort: "Sort",
  page: "Page",
  pageSize: "Rows per page",
} as const;

/** The Status control's choices: any, then every status in the order a quote moves through. */
export const STATUS_FILTER_OPTIONS = [
  { value: "", label: "Any status" },
  ...QUOTE_STATUSES.map((s) => ({ value: s, label: STATUS_LABEL[s] })),
] as const;

/**
 * The query string of a list view: only what differs from "any" and the first page, so the
 * plain list is the plain address.
 *
 * @example
 * quoteListSearch({ q: "dace", status: undefined, sort: "newest", page: 3 }); // "q=dace&page=3"
 */
export function quoteListSearch(query: Partial<QuoteListQuery>): string {
  const params = new URLSearchParams();
  if (query.q) params.set("q", query.q);
  if (query.status) params.set("status", query.status);
  if (query.sort && query.sort !== "newest") params.set("sort", query.sort);
  if (query.page && query.page > 1) params.set("page", String(query.page));
  if (query.pageSize && query.pageSize !== QUOTE_PAGE_SIZE) params.set("pageSize", String(query.pageSize));
  return params.toString();
}
