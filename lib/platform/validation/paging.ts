import { z } from "zod";

/**
 * `page` and `pageSize` of a server-paged list's query string, with the messages every list uses.
 *
 * @example
 * const schema = z.object({ q: z.string().optional(), ...pagingFields(200) });
 * schema.parse({ page: "2", pageSize: "25" }); // { page: 2, pageSize: 25 }
 */
export function pagingFields(maxPageSize: number) {
  const sizeMessage = `Use 1 to ${maxPageSize} rows per page.`;
  return {
    page: z.coerce
      .number("Use a page number.")
      .int("Use a whole page number.")
      .min(1, "Pages start at 1.")
      .max(100000, "Use a page number up to 100,000.")
      .optional(),
    pageSize: z.coerce.number(sizeMessage).int(sizeMessage).min(1, sizeMessage).max(maxPageSize, sizeMessage).optional(),
  };
}
