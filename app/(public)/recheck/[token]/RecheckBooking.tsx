"use client";
import { LinkBooking } from "@/components/bookings/LinkBooking";
import type { Booking } from "@/lib/shop/bookings/api";
import { RECHECK_BOOKING_DAYS } from "@/lib/shop/workOrders/recheckLink";

/** The customer picks a re-check time among the shop's free starts, or sees the one booked. */
export function RecheckBooking({
  token,
  booking,
  shopName,
  shopPhone,
  slotMinutes,
}: {
  token: string;
  /** The shop's re-check length. */
  slotMinutes: number;
  booking: Booking | null;
  shopName: string;
  shopPhone: string;
}) {
  const call = shopPhone ? `call ${shopName} on ${shopPhone}` : `contact ${shopName}`;
  return (
    <LinkBooking
      title="Re-check time"
      base={`/api/recheck/${token}`}
      booking={booking}
      changeNote={`To move or cancel it, ${call}.`}
      idPrefix="recheck"
      intro={
        <p className="text-sm text-basalt-700">
          The re-check takes about {slotMinutes} minutes. Pick a time in the next {RECHECK_BOOKING_DAYS} days, or {call}.
        </p>
      }
    />
  );
}
