import type { Role } from "@/lib/platform/db/types";

/**
 * What the account page tells each role it may do. The garage, the navigation and the role
 * matrix follow these words (roleSummary.test.ts beside this file holds them together).
 */
export const ROLE_SUMMARY: Record<Role, { title: string; items: string[] }> = {
  member: {
    title: "Member",
    items: [
      "Compare setups and keep the comparisons you save",
      "Keep vehicles with their measured clearances",
      "Share a comparison by link",
    ],
  },
  shop_staff: {
    title: "Shop staff",
    items: [
      "Everything a member can do: your garage and saved comparisons are yours alone, the shop does not see them",
      "Read your shop's catalog",
      "Create and send quotes at the counter (customers' vehicles are kept with the customer, not in your garage)",
    ],
  },
  shop_owner: {
    title: "Shop owner",
    items: ["Everything shop staff can do", "Manage the shop's settings, catalog and staff", "See every quote of the shop"],
  },
  admin: { title: "Admin", items: ["Everything a member can do", "List users and change their roles", "Read the development outbox"] },
};
