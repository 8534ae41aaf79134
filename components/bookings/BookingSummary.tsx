import { Badge } from "@/components/ui/Badge";
import type { Booking } from "@/lib/shop/bookings/api";
import { BAY_KIND_LABEL, BOOKING_STATUS_LABEL, BOOKING_STATUS_TONE } from "@/lib/shop/bookings/vocabulary";
import { formatClock } from "@/lib/shop/bookings/zoned";

/** A booking as the customer and the counter read it: when, on the shop's clock, and in which bays. */
export function BookingSummary({ booking, showBays = false }: { booking: Booking; showBays?: boolean }) {
  return (
    <div className="flex flex-col gap-1 text-sm" data-testid="booking-summary">
      <p>
        <Badge tone={BOOKING_STATUS_TONE[booking.status]}>{BOOKING_STATUS_LABEL[booking.status]}</Badge>{" "}
        <span data-testid="booking-when">{booking.when}</span>
      </p>
      {showBays && booking.bays.length > 0 && (
        <ul className="text-basalt-700">
          {booking.bays.map((b) => (
            <li key={`${b.bayId}-${b.startsAt}`}>
              {formatClock(b.startsAt, booking.timeZone)}–{formatClock(b.endsAt, booking.timeZone)}: {b.bayName} (
              {BAY_KIND_LABEL[b.bayKind].toLowerCase()})
            </li>
          ))}
        </ul>
      )}
      <p className="text-basalt-600">Booked by {booking.bookedBy}.</p>
    </div>
  );
}
