"use client";
import Link from "next/link";
import { useState } from "react";
import { BookingSummary } from "@/components/bookings/BookingSummary";
import { WorkOrderButton } from "@/components/bookings/WorkOrderButton";
import { SlotPicker } from "@/components/bookings/SlotPicker";
import { Alert } from "@/components/ui/Alert";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import type { CalendarBooking } from "@/lib/shop/bookings/api";
import { BOOKING_KIND_LABEL } from "@/lib/shop/bookings/vocabulary";
import { CANCELLED, MOVED, bookingUrl, deleteBooking, putMove } from "./useBookingMove";

/**
 * The booking picked on the calendar (click, or Enter on a focused booking): what it is for, a
 * link to its quote, "Move…" (the keyboard's way to move it: the free starts that fit its work,
 * each sent to the same move route a drag uses) and "Cancel booking". Installs and re-checks
 * alike: the server checks every move again and e-mails the customer the changed calendar entry.
 */
export function SelectedBooking({
  booking,
  onChanged,
  onClose,
}: {
  booking: CalendarBooking;
  /** After the server moved or cancelled it, with the words to say. */
  onChanged: (text: string) => Promise<void>;
  onClose: () => void;
}) {
  const [picking, setPicking] = useState(false);
  const [cancelling, setCancelling] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const what = BOOKING_KIND_LABEL[booking.kind];
  const cancel = async () => {
    if (!window.confirm(`Cancel this ${what.toLowerCase()} booking? The customer is e-mailed a cancellation for their calendar.`)) return;
    setCancelling(true);
    setError(null);
    try {
      await deleteBooking(booking.id);
      await onChanged(CANCELLED);
    } catch (e) {
      setError((e as Error).message);
    }
    setCancelling(false);
  };
  return (
    <Card className="mt-4 flex flex-col gap-3" role="region" aria-label="Selected booking">
      <h2 className="text-lg font-semibold">
        {booking.kind === "recheck" && `${what} · `}Q-{booking.quoteNumber} · {booking.customerName}
      </h2>
      <p className="text-sm text-basalt-700">Vehicle: {booking.vehicleDescription}</p>
      <BookingSummary booking={booking} showBays />
      {!booking.quoteOpen && (
        <p className="text-sm text-basalt-600">
          Quote Q-{booking.quoteNumber} was written by someone else at the counter: it opens for them and the owner.
        </p>
      )}
      <div aria-live="polite">{error && <Alert tone="error">{error}</Alert>}</div>
      <div className="flex flex-wrap gap-2">
        {booking.quoteOpen && (
          <Link className={buttonClass("primary")} href={`/shop/quotes/${booking.quoteId}`}>
            Open quote Q-{booking.quoteNumber}
          </Link>
        )}
        {(booking.kind === "install" || booking.workOrderId) && (
          <WorkOrderButton
            quoteId={booking.quoteId}
            workOrderId={booking.workOrderId}
            variant={booking.quoteOpen ? "secondary" : "primary"}
          />
        )}
        {!picking && (
          <Button type="button" variant="secondary" onClick={() => setPicking(true)}>
            Move…
          </Button>
        )}
        <Button type="button" variant="danger" pending={cancelling} onClick={() => void cancel()}>
          Cancel booking
        </Button>
        <Button type="button" variant="ghost" onClick={onClose}>
          Close
        </Button>
      </div>
      {picking && (
        <SlotPicker
          idPrefix={`calendar-${booking.id}`}
          slotsUrl={`${bookingUrl(booking.id)}/slots`}
          actionLabel={(words) => `Move to ${words}`}
          onPick={async (start) => {
            await putMove(booking.id, { start });
            setPicking(false);
            await onChanged(MOVED);
          }}
        />
      )}
    </Card>
  );
}
