// @vitest-environment jsdom
import { cleanup, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import type { StaffData } from "@/lib/shop/api";
import { renderWithQuery } from "@/app/(shop)/shop/shopTestUtil";
import { StaffPanel } from "./StaffPanel";

afterEach(cleanup);

const OWNER = "0a000000-0000-4000-8000-000000000001";
const data: StaffData = {
  team: [{ id: OWNER, name: "Olive Owner", email: "olive@example.test", role: "shop_owner" }],
  // 03:30 UTC on Dec 4 is 8:30 PM on Dec 3 in Denver (MST, UTC−7: 49 CFR §71.9).
  invites: [{ id: "i1", email: "new-hire@example.test", expiresAt: "2026-12-04T03:30:00.000Z", createdAt: "2026-12-01T03:30:00.000Z" }],
  timeZone: "America/Denver",
};

describe("the staff panel", () => {
  it("dates an open invitation's expiry on the shop's clock, not the device's (vitest runs in UTC)", () => {
    renderWithQuery(<StaffPanel initial={data} selfId={OWNER} />, { retry: false, staleTime: Infinity });
    const invite = screen.getAllByRole("listitem").find((li) => li.textContent?.includes("new-hire@example.test"))!;
    expect(invite.textContent).toContain("new-hire@example.test · expires Thu, Dec 3, 2026, 8:30 PM MST");
  });
});
