import type { Role } from "@/lib/platform/db/types";

export interface NavItem {
  href: string;
  label: string;
  /** Who sees the link; the pages and routes check again on the server. */
  roles: "all" | "signed-in" | Role[];
}

export const NAV: NavItem[] = [
  { href: "/workspace", label: "Workspace", roles: "all" },
  { href: "/convert", label: "Converter", roles: "all" },
  { href: "/beadlock", label: "Ring helper", roles: "all" },
  { href: "/garage", label: "Garage", roles: "signed-in" },
  { href: "/comparisons", label: "My comparisons", roles: "signed-in" },
  { href: "/account", label: "Account", roles: "signed-in" },
  { href: "/shop", label: "Shop", roles: ["shop_staff", "shop_owner"] },
  { href: "/admin/users", label: "Users", roles: ["admin"] },
  { href: "/admin/outbox", label: "Outbox", roles: ["admin"] },
  { href: "/admin/jobs", label: "Jobs", roles: ["admin"] },
];

export function visibleNav(role: Role | null): NavItem[] {
  return NAV.filter((n) => n.roles === "all" || (role && (n.roles === "signed-in" || n.roles.includes(role))));
}
