import { type OverviewTable, OverviewTableSection } from "./OverviewTableSection";
import { BAY_KIND_LABEL } from "@/lib/shop/bookings/vocabulary";
import { formatDay } from "@/lib/shop/bookings/zoned";
import { type BayWeek, bookedShare, hoursLabel } from "@/lib/shop/overview";

const BAYS_TABLE: OverviewTable<BayWeek> = {
  caption: "Bookings per bay this week",
  testId: "overview-bays",
  rowKey: (b) => b.bayId,
  empty: "No bays yet: add them under Bays and hours.",
  columns: [
    { id: "bay", header: "Bay", cell: (b) => <span className="font-medium">{b.bayName}</span> },
    { id: "kind", header: "Kind", cell: (b) => BAY_KIND_LABEL[b.bayKind] },
    { id: "bookings", header: "Bookings", align: "end", cell: (b) => b.bookings },
    { id: "booked", header: "Booked", align: "end", cell: (b) => hoursLabel(b.bookedMinutes) },
    { id: "open", header: "Open", align: "end", cell: (b) => hoursLabel(b.openMinutes) },
    { id: "share", header: "Share booked", align: "end", cell: (b) => bookedShare(b.bookedMinutes, b.openMinutes) },
  ],
};

/** This week's live bookings per bay, and the hours they hold against the hours the bay is open. */
export function BaysWeekCard({ week }: { week: { from: string; to: string; bays: BayWeek[] } }) {
  return (
    <OverviewTableSection
      id="overview-week"
      title="This week in the bays"
      lead={`${formatDay(week.from)} to ${formatDay(week.to)}`}
      table={BAYS_TABLE}
      rows={week.bays}
    />
  );
}
