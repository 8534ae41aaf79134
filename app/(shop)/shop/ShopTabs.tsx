"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { cx } from "@/components/ui/cx";

export interface Tab {
  href: string;
  label: string;
}

/** The shop area's own navigation; the current tab is marked for screen readers too. */
export function ShopTabs({ tabs }: { tabs: Tab[] }) {
  const path = usePathname();
  const current = (href: string) => (href === "/shop" ? path === "/shop" : path === href || path.startsWith(`${href}/`));
  return (
    <nav aria-label="Shop" className="no-print mb-6 flex flex-wrap gap-1 border-b border-basalt-200 pb-2 text-sm">
      {tabs.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={current(t.href) ? "page" : undefined}
          className={cx(
            "rounded-md px-3 py-2 font-medium",
            current(t.href) ? "bg-basalt-900 text-white" : "text-basalt-700 hover:bg-basalt-100",
          )}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
