"use client";
import { useQueryClient } from "@tanstack/react-query";
import { type ReactNode, useState } from "react";
import { BookingSummary } from "@/components/bookings/BookingSummary";
import { SlotPicker } from "@/components/bookings/SlotPicker";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { Booking } from "@/lib/shop/bookings/api";

interface Props {
  /** The card's heading and region name, e.g. "Install time". */
  title: string;
  /** The customer's link's routes: GET `${base}/slots`, POST `${base}/booking`. */
  base: string;
  booking: Booking | null;
  /** How to move or cancel once booked ("To move or cancel it, call …"). */
  changeNote: string;
  idPrefix: string;
  /** Said above the free starts. */
  intro?: ReactNode;
  onBooked?: () => void;
}

/** On a customer's link: pick a time among the shop's free starts, or see the one booked. */
export function LinkBooking({ title, base, booking, changeNote, idPrefix, intro, onBooked }: Props) {
  const queryClient = useQueryClient();
  const [done, setDone] = useState<Booking | null>(null);
  const shown = done ?? booking;
  return (
    <Card className="flex flex-col gap-3" role="region" aria-label={title}>
      <h2 className="text-lg font-semibold">{title}</h2>
      {shown ? (
        <>
          <div aria-live="polite">
            {done && <Alert tone="success">Booked. A confirmation with a calendar file is on its way to your e-mail.</Alert>}
          </div>
          <BookingSummary booking={shown} />
          <p className="text-sm text-basalt-600">{changeNote}</p>
        </>
      ) : (
        <>
          {intro}
          <SlotPicker
            idPrefix={idPrefix}
            slotsUrl={`${base}/slots`}
            actionLabel={(words) => `Book ${words}`}
            onPick={async (start) => {
              const r = await api<{ booking: Booking }>(`${base}/booking`, { body: { start } });
              setDone(r.booking);
              await queryClient.invalidateQueries({ queryKey: queryKeys.shop.slots.all });
              onBooked?.();
            }}
          />
        </>
      )}
    </Card>
  );
}
