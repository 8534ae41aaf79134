// @vitest-environment jsdom
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { answerFetch } from "@/tests/support/fetchAnswer";
import { renderWithQuery } from "@/app/(shop)/shop/shopTestUtil";
import { CatalogTable } from "./CatalogTable";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const renderTable = (canEdit: boolean) => renderWithQuery(<CatalogTable canEdit={canEdit} />, { retry: false });

describe("CatalogTable's archived items", () => {
  it("lets the owner list the archived items only, from page 1, to find one and bring it back", async () => {
    const fetch = answerFetch(200, { items: [], total: 0, page: 1, pageSize: 25 });
    renderTable(true);
    await waitFor(() => expect(fetch).toHaveBeenCalled());
    expect(String(fetch.mock.calls[0]![0])).not.toContain("archived");
    await userEvent.click(screen.getByRole("checkbox", { name: "Archived items only" }));
    await waitFor(() => expect(String(fetch.mock.lastCall![0])).toContain("archived=1"));
    expect(String(fetch.mock.lastCall![0])).toContain("page=1&");
    expect(await screen.findByText("No archived item matches.")).toBeTruthy();
    expect(screen.getByText("0 archived items")).toBeTruthy();
  });

  it("says one item in the singular", async () => {
    answerFetch(200, { items: [], total: 1, page: 1, pageSize: 25 });
    renderTable(true);
    expect(await screen.findByText("1 item")).toBeTruthy();
  });

  it("offers staff no archived view (only owners archive and bring items back)", async () => {
    answerFetch(200, { items: [], total: 0, page: 1, pageSize: 25 });
    renderTable(false);
    expect(screen.queryByRole("checkbox", { name: "Archived items only" })).toBeNull();
  });
});
