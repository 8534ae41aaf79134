import type { Metadata } from "next";
import Link from "next/link";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { BulletList } from "@/components/ui/BulletList";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { SignOutEverywhereButton } from "@/components/site/SignOutEverywhereButton";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { shopQueries } from "@/lib/shop/queries";
import { userQueries } from "@/lib/accounts/queries";
import { ROLE_SUMMARY } from "./roleSummary";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage({ searchParams }: { searchParams: Promise<{ welcome?: string }> }) {
  const caller = await requirePageCaller("/account");
  const [user, sp] = await Promise.all([userQueries.findUserById(caller.userId), searchParams]);
  const shop = caller.shopId ? await shopQueries.findShop(caller.shopId) : null;
  const can = ROLE_SUMMARY[caller.role];
  return (
    <>
      <PageHeader title={`Hello, ${user?.name ?? caller.name}`} lead={user?.email} />
      {sp.welcome && (
        <Alert tone="success" className="mb-6">
          Your account is ready.
        </Alert>
      )}
      <div className="grid gap-6 md:grid-cols-2">
        <Card>
          <h2 className="text-lg font-semibold">Your role</h2>
          <p className="mt-2 flex items-center gap-2">
            <Badge tone="ember">{can.title}</Badge>
            {shop && <span className="text-sm text-basalt-600">at {shop.name}</span>}
          </p>
          <BulletList items={can.items} className="mt-4 space-y-1 text-sm text-basalt-700" />
        </Card>
        <Card>
          <h2 className="text-lg font-semibold">Where to go</h2>
          <ul className="mt-3 space-y-2 text-sm">
            {(caller.role === "shop_staff" || caller.role === "shop_owner") && (
              <li>
                <Link className="text-ember-700 underline" href="/shop">
                  Your shop
                </Link>
              </li>
            )}
            {caller.role === "admin" && (
              <>
                <li>
                  <Link className="text-ember-700 underline" href="/admin/users">
                    Users and roles
                  </Link>
                </li>
                <li>
                  <Link className="text-ember-700 underline" href="/admin/outbox">
                    Development outbox
                  </Link>
                </li>
                <li>
                  <Link className="text-ember-700 underline" href="/admin/jobs">
                    Background jobs (failed mail and scheduled work)
                  </Link>
                </li>
              </>
            )}
            <li>
              <Link className="text-ember-700 underline" href="/forgot-password">
                Change your password by e-mail
              </Link>
            </li>
          </ul>
        </Card>
        <Card>
          <h2 className="text-lg font-semibold">Sessions</h2>
          <p className="mt-2 text-sm text-basalt-700">
            Signed in on a shared computer, or lost a phone? This ends every session of your account at once, this one included. Changing
            your password does the same.
          </p>
          <div className="mt-4">
            <SignOutEverywhereButton />
          </div>
        </Card>
      </div>
    </>
  );
}
