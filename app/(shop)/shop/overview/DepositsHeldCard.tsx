import { QuoteNumberLink } from "@/components/quotes/QuoteNumberLink";
import { Table } from "@/components/ui/Table";
import { OverviewSection } from "./OverviewSection";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import type { DepositHeld } from "@/lib/shop/overview";
import { formatUsd } from "@/lib/shop/quotes/money";

/** Paid deposits on quotes whose work is not done yet (refunds taken off), with their total. */
export function DepositsHeldCard({ deposits, timeZone }: { deposits: { items: DepositHeld[]; totalCents: number }; timeZone: string }) {
  return (
    <OverviewSection
      id="overview-deposits"
      title="Deposits held"
      lead={
        <>
          Paid on quotes not installed yet:{" "}
          <span className="font-semibold text-basalt-900" data-testid="deposits-total">
            {formatUsd(deposits.totalCents)}
          </span>{" "}
          on {deposits.items.length} {deposits.items.length === 1 ? "quote" : "quotes"}.
        </>
      }
    >
      <Table
        caption="Deposits held, oldest payment first"
        testId="overview-deposits-table"
        rows={deposits.items}
        rowKey={(d) => d.quoteId}
        empty="No deposits held."
        columns={[
          {
            id: "quote",
            header: "Quote",
            cell: (d) => <QuoteNumberLink id={d.quoteId} number={d.quoteNumber} />,
          },
          { id: "customer", header: "Customer", cell: (d) => d.customerName },
          { id: "vehicle", header: "Vehicle", cell: (d) => d.vehicle },
          { id: "install", header: "Install", cell: (d) => (d.installAt ? formatInstant(d.installAt, timeZone) : "Not booked") },
          { id: "held", header: "Held", align: "end", cell: (d) => formatUsd(d.heldCents) },
        ]}
      />
    </OverviewSection>
  );
}
