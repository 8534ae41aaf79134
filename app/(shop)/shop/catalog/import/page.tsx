import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { SHOP_OWNER } from "@/lib/shop/queries";
import { CSV_MAX_BYTES } from "@/lib/shop/catalog/csv";
import { ImportFlow } from "./ImportFlow";

export const metadata: Metadata = { title: "Import catalog" };

export default async function ImportPage() {
  await requirePageCaller("/shop/catalog/import", SHOP_OWNER);
  return (
    <>
      <PageHeader
        title="Import catalog"
        lead={
          <>
            Upload a CSV in the Hubface catalog format (UTF-8, at most {CSV_MAX_BYTES / 1024 / 1024} MB). You see a row-by-row report first;
            nothing changes until you confirm. Items are matched by SKU: existing ones are updated, new ones added.{" "}
            <a className="text-ember-700 underline" href="/api/shop/catalog/template" download>
              Download the template
            </a>
            .
          </>
        }
      />
      <ImportFlow />
    </>
  );
}
