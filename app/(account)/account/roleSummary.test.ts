import { describe, expect, it } from "vitest";
import { ROLE_SUMMARY } from "@/app/(account)/account/roleSummary";
import { visibleNav } from "@/components/site/nav";
import { ROLES, type Role } from "@/lib/platform/db/types";
import { GARAGE_ACCESS } from "@/lib/garage/access";

/**
 * What the account page tells each role it may do, what the navigation offers it and what the
 * garage's pages and routes admit must be one story: a role told "everything a member can do"
 * (or everything a role that can) gets the member's garage, sees its link, and is let in.
 */
/** GARAGE_ACCESS is the role list every garage page and route hands to requirePageCaller / route(). */
const garageAdmits = (role: Role) => (GARAGE_ACCESS as readonly string[]).includes(role);

/** Roles whose summary promises what members (directly or through another role) can do. */
function promisedMemberAbilities(role: Role, seen = new Set<Role>()): boolean {
  if (role === "member") return true;
  if (seen.has(role)) return false;
  seen.add(role);
  const first = ROLE_SUMMARY[role].items[0] ?? "";
  const via = ROLES.find(
    (r) =>
      first.toLowerCase().startsWith(`everything ${ROLE_SUMMARY[r].title.toLowerCase()} can do`) ||
      (r === "member" && /^everything a member can do/i.test(first)),
  );
  return via !== undefined && promisedMemberAbilities(via, seen);
}

describe("role words and rules agree", () => {
  it("every role promised the member's abilities is admitted to the garage and offered its link", () => {
    for (const role of ROLES) {
      const promised = promisedMemberAbilities(role);
      expect(garageAdmits(role), `${role}: garage admits`).toBe(promised);
      expect(
        visibleNav(role).some((n) => n.href === "/garage"),
        `${role}: Garage link`,
      ).toBe(promised);
    }
  });

  it("shop staff and owners are among them (a shop account is the person's own account, see lib/garage/access.ts)", () => {
    expect(promisedMemberAbilities("shop_staff")).toBe(true);
    expect(promisedMemberAbilities("shop_owner")).toBe(true);
  });
});
