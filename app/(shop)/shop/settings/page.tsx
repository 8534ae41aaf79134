import type { Metadata } from "next";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { formatBp, formatCents } from "@/lib/shop/quotes/money";
import { shopIdOf, shopQueries, SHOP_OWNER } from "@/lib/shop/queries";
import { SettingsForm } from "./SettingsForm";

export const metadata: Metadata = { title: "Shop settings" };

export default async function SettingsPage() {
  const caller = await requirePageCaller("/shop/settings", SHOP_OWNER);
  const shop = await pageGuard(shopQueries.getShop(shopIdOf(caller)));
  return (
    <>
      <PageHeader
        title="Shop settings"
        lead="What every quote carries: your shop's header, tax, labour rates, how long a quote holds and the deposit asked."
      />
      <Card className="max-w-2xl">
        <SettingsForm
          initial={{
            name: shop.name,
            address: shop.address,
            phone: shop.phone,
            taxRate: formatBp(shop.tax_rate_bp),
            labourRate: formatCents(shop.labour_rate_cents).replace(/,/g, ""),
            fabricationRate: formatCents(shop.fabrication_rate_cents).replace(/,/g, ""),
            quoteValidityDays: String(shop.quote_validity_days),
            depositPct: String(shop.deposit_pct),
            currency: "USD",
            noticeEmail: shop.notice_email,
          }}
        />
      </Card>
    </>
  );
}
