import Link from "next/link";
import { Logo } from "@/components/ui/Logo";
import { buttonClass } from "@/components/ui/Button";
import { currentCaller } from "@/lib/platform/auth/session";
import { SignOutButton } from "./SignOutButton";
import { visibleNav } from "./nav";

const ROLE_LABEL = { member: "Member", shop_staff: "Shop staff", shop_owner: "Shop owner", admin: "Admin" } as const;

export async function SiteHeader() {
  const caller = await currentCaller().catch(() => null);
  const items = visibleNav(caller?.role ?? null);
  return (
    <header className="no-print border-b border-basalt-200 bg-white/80 backdrop-blur">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-3 sm:px-6">
        <Link href="/" aria-label="Hubface home">
          <Logo />
        </Link>
        <nav aria-label="Main" className="flex flex-wrap items-center gap-1 text-sm">
          {items.map((n) => (
            <Link key={n.href} href={n.href} className="rounded-md px-3 py-2 font-medium text-basalt-700 hover:bg-basalt-100">
              {n.label}
            </Link>
          ))}
          {caller ? (
            <>
              <span className="hidden px-2 text-basalt-500 sm:inline" data-testid="signed-in-as">
                {caller.name} · {ROLE_LABEL[caller.role]}
              </span>
              <SignOutButton />
            </>
          ) : (
            <>
              <Link href="/sign-in" className="rounded-md px-3 py-2 font-medium text-basalt-700 hover:bg-basalt-100">
                Sign in
              </Link>
              <Link href="/sign-up" className={buttonClass("primary", "min-h-9 py-1.5")}>
                Create account
              </Link>
            </>
          )}
        </nav>
      </div>
    </header>
  );
}
