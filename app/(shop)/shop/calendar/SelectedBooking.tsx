"use client";
import Link from "next/link";
import { useState } from "react";
import { BookingSummary } from "@/components/bookings/BookingSummary";
import { SlotPicker } from "@/components/bookings/SlotPicker";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import type { CalendarBooking } from "@/lib/shop/bookings/api";
import { putMove } from "./useBookingMove";

/**
 * The booking picked on the calendar (click, or Enter on a focused booking): what it is for, a
 * link to its quote, and "Move…", the keyboard's way to move it: the free starts that fit its
 * work, each sent to the same move route a drag uses.
 */
export function SelectedBooking({
  booking,
  onMoved,
  onClose,
}: {
  booking: CalendarBooking;
  onMoved: () => Promise<void>;
  onClose: () => void;
}) {
  const [picking, setPicking] = useState(false);
  const url = `/api/shop/quotes/${booking.quoteId}/booking`;
  return (
    <Card className="mt-4 flex flex-col gap-3" role="region" aria-label="Selected booking">
      <h2 className="text-lg font-semibold">
        {booking.kind === "recheck" && "Lug and ring re-check · "}Q-{booking.quoteNumber} · {booking.customerName}
      </h2>
      <p className="text-sm text-basalt-700">Vehicle: {booking.vehicleDescription}</p>
      <BookingSummary booking={booking} showBays />
      {booking.kind === "recheck" && (
        <p className="text-sm text-basalt-600">Booked by the customer on the re-check link; call them to change it.</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Link className={buttonClass("primary")} href={`/shop/quotes/${booking.quoteId}`}>
          Open quote Q-{booking.quoteNumber}
        </Link>
        {!picking && booking.kind === "install" && (
          <Button type="button" variant="secondary" onClick={() => setPicking(true)}>
            Move…
          </Button>
        )}
        <Button type="button" variant="ghost" onClick={onClose}>
          Close
        </Button>
      </div>
      {picking && (
        <SlotPicker
          idPrefix={`calendar-${booking.id}`}
          slotsUrl={`${url}/slots`}
          actionLabel={(words) => `Move to ${words}`}
          onPick={async (start) => {
            await putMove(booking.quoteId, { start });
            setPicking(false);
            await onMoved();
          }}
        />
      )}
    </Card>
  );
}
