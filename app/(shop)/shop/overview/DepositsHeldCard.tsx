import { QuoteNumberLink } from "@/components/quotes/QuoteNumberLink";
import { type OverviewTable, OverviewTableSection } from "./OverviewTableSection";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import type { DepositHeld } from "@/lib/shop/overview";
import { formatUsd } from "@/lib/shop/quotes/money";

/** The deposits table; install times read on the shop's clock. */
function depositsTable(timeZone: string): OverviewTable<DepositHeld> {
  return {
    caption: "Deposits held, oldest payment first",
    testId: "overview-deposits-table",
    rowKey: (d) => d.quoteId,
    empty: "No deposits held.",
    columns: [
      {
        id: "quote",
        header: "Quote",
        cell: (d) => <QuoteNumberLink id={d.quoteId} number={d.quoteNumber} />,
      },
      { id: "customer", header: "Customer", cell: (d) => d.customerName },
      { id: "vehicle", header: "Vehicle", cell: (d) => d.vehicle },
      { id: "install", header: "Install", cell: (d) => (d.installAt ? formatInstant(d.installAt, timeZone) : "Not booked") },
      { id: "held", header: "Held", align: "end", cell: (d) => formatUsd(d.heldCents) },
    ],
  };
}

/** Paid deposits on quotes whose work is not done yet (refunds taken off), with their total. */
export function DepositsHeldCard({ deposits, timeZone }: { deposits: { items: DepositHeld[]; totalCents: number }; timeZone: string }) {
  return (
    <OverviewTableSection
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
      table={depositsTable(timeZone)}
      rows={deposits.items}
    />
  );
}
