import { type DefaultOptions, QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render } from "@testing-library/react";
import type { ReactElement } from "react";

/**
 * Component tests' render for a shop component: inside a query client of its own, as the shop
 * layout's QueryLayout gives one. `queries` are the client's query defaults where a test needs
 * them (`{ retry: false }`: a refused load shows its error at once instead of after retries).
 *
 * @example renderWithQuery(<CatalogTable canEdit />, { retry: false });
 */
export function renderWithQuery(ui: ReactElement, queries?: DefaultOptions["queries"]) {
  return render(<QueryClientProvider client={new QueryClient(queries && { defaultOptions: { queries } })}>{ui}</QueryClientProvider>);
}
