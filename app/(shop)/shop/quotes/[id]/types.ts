import type { QuoteEventRow, QuoteLineRow, QuoteRow } from "@/lib/db/types";
import type { HubCheck } from "@/lib/quotes/document";

/** A row as it arrives in the browser: dates are ISO strings. */
type J<T> = { [K in keyof T]: T[K] extends Date ? string : T[K] extends Date | null ? string | null : T[K] };

/** The quote detail the editor receives from the page and from every mutation. */
export interface Detail {
  quote: J<Omit<QuoteRow, "public_token_hash">>;
  lines: J<QuoteLineRow>[];
  events: J<QuoteEventRow>[];
  customer: { id: string; name: string; phone: string; email: string };
  createdByName: string | null;
  hubChecks: HubCheck[];
}
