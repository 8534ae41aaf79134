// @vitest-environment jsdom
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { answerFetch } from "@/tests/support/fetchAnswer";
import { router } from "@/tests/support/navigation";
import { renderWithQuery } from "@/app/(shop)/shop/shopTestUtil";
import { ArchiveItemButton } from "./ArchiveItemButton";

vi.mock("next/navigation", () => import("@/tests/support/navigation"));
const { refresh } = router;
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.clearAllMocks();
});

const ITEM = "c1000000-0000-4000-8000-0000000000bb";
const renderButton = (archived: boolean) => renderWithQuery(<ArchiveItemButton itemId={ITEM} archived={archived} />);

describe("ArchiveItemButton", () => {
  it("archives a listed item and refreshes the page", async () => {
    const fetch = answerFetch(200, { item: {} });
    renderButton(false);
    await userEvent.click(screen.getByRole("button", { name: "Archive item" }));
    await waitFor(() => expect(refresh).toHaveBeenCalled());
    const [url, init] = fetch.mock.calls[0]!;
    expect(url).toBe(`/api/shop/catalog/${ITEM}/archived`);
    expect(JSON.parse(String(init.body))).toEqual({ archived: true });
  });

  it("brings an archived item back, and shows the server's refusal in words", async () => {
    const fetch = answerFetch(403, { error: "Your account's role does not allow this." });
    renderButton(true);
    await userEvent.click(screen.getByRole("button", { name: "Bring back into the catalog" }));
    expect(await screen.findByText("Your account's role does not allow this.")).toBeTruthy();
    expect(JSON.parse(String(fetch.mock.calls[0]![1].body))).toEqual({ archived: false });
    expect(refresh).not.toHaveBeenCalled();
  });
});
