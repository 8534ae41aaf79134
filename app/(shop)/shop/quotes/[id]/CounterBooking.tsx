"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { BookingSummary } from "@/components/bookings/BookingSummary";
import { SlotPicker } from "@/components/bookings/SlotPicker";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { SelectField } from "@/components/ui/SelectField";
import { api } from "@/lib/platform/client/api";
import type { Bay, Booking } from "@/lib/shop/bookings/api";
import { BAY_KIND_LABEL } from "@/lib/shop/bookings/vocabulary";
import { queryKeys } from "@/lib/platform/query/keys";

/** At the counter: book the install for a paid quote, or move or cancel its booking. */
export function CounterBooking({ quoteId, initial, bays }: { quoteId: string; initial: Booking | null; bays: Bay[] }) {
  const queryClient = useQueryClient();
  const [booking, setBooking] = useState<Booking | null>(initial);
  const [picking, setPicking] = useState(initial === null);
  const [bayId, setBayId] = useState("");
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [cancelling, setCancelling] = useState(false);
  const url = `/api/shop/quotes/${quoteId}/booking`;
  const after = async (b: Booking, text: string) => {
    setBooking(b.status === "cancelled" ? null : b);
    setPicking(b.status === "cancelled");
    setMessage({ tone: "success", text });
    await queryClient.invalidateQueries({ queryKey: queryKeys.shop.slots.all });
  };
  const cancel = async () => {
    if (!window.confirm("Cancel this install booking? The customer is e-mailed a cancellation for their calendar.")) return;
    setCancelling(true);
    setMessage(null);
    try {
      const r = await api<{ booking: Booking }>(url, { method: "DELETE" });
      await after(r.booking, "Booking cancelled; the customer's calendar entry is withdrawn by e-mail.");
    } catch (e) {
      setMessage({ tone: "error", text: (e as Error).message });
    }
    setCancelling(false);
  };
  return (
    <Card className="mt-5 flex flex-col gap-3" role="region" aria-label="Install booking">
      <h2 className="text-lg font-semibold">Install booking</h2>
      <div aria-live="polite">{message && <Alert tone={message.tone}>{message.text}</Alert>}</div>
      {booking && <BookingSummary booking={booking} showBays />}
      {booking && !picking && (
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" onClick={() => setPicking(true)}>
            Move to another time
          </Button>
          <Button type="button" variant="danger" pending={cancelling} onClick={() => void cancel()}>
            Cancel booking
          </Button>
        </div>
      )}
      {picking && (
        <>
          {bays.length > 1 && (
            <SelectField
              label="Bay"
              name="bayId"
              className="max-w-sm"
              value={bayId}
              onChange={(e) => setBayId(e.target.value)}
              options={[
                { value: "", label: "Any free bay" },
                ...bays.map((b) => ({ value: b.id, label: `${b.name} (${BAY_KIND_LABEL[b.kind].toLowerCase()})` })),
              ]}
              hint="The list shows times with any free bay; a chosen bay must be free at the time picked."
            />
          )}
          <SlotPicker
            idPrefix="counter"
            slotsUrl={`${url}/slots`}
            actionLabel={(words) => (booking ? `Move to ${words}` : `Book ${words}`)}
            onPick={async (start) => {
              const body = { start, ...(bayId ? { bayId } : {}) };
              const r = booking
                ? await api<{ booking: Booking }>(url, { method: "PUT", body })
                : await api<{ booking: Booking }>(url, { body });
              await after(
                r.booking,
                booking
                  ? "Moved; the customer is e-mailed the updated calendar entry."
                  : "Booked; the customer is e-mailed a confirmation with a calendar file.",
              );
            }}
          />
          {booking && (
            <Button type="button" variant="ghost" className="self-start" onClick={() => setPicking(false)}>
              Keep the current time
            </Button>
          )}
        </>
      )}
    </Card>
  );
}
