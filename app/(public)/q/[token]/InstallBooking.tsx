"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { BookingSummary } from "@/components/bookings/BookingSummary";
import { SlotPicker } from "@/components/bookings/SlotPicker";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import type { Booking } from "@/lib/shop/bookings/api";
import { queryKeys } from "@/lib/platform/query/keys";

/** After the deposit: the customer picks the install time on their link, or sees the one booked. */
export function InstallBooking({ token, booking, shopName }: { token: string; booking: Booking | null; shopName: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [done, setDone] = useState<Booking | null>(null);
  const shown = done ?? booking;
  return (
    <Card className="flex flex-col gap-3" role="region" aria-label="Install time">
      <h2 className="text-lg font-semibold">Install time</h2>
      {shown ? (
        <>
          <div aria-live="polite">
            {done && <Alert tone="success">Booked. A confirmation with a calendar file is on its way to your e-mail.</Alert>}
          </div>
          <BookingSummary booking={shown} />
          <p className="text-sm text-basalt-600">To move or cancel it, call {shopName}.</p>
        </>
      ) : (
        <SlotPicker
          idPrefix="q"
          slotsUrl={`/api/q/${token}/slots`}
          actionLabel={(words) => `Book ${words}`}
          onPick={async (start) => {
            const r = await api<{ booking: Booking }>(`/api/q/${token}/booking`, { body: { start } });
            setDone(r.booking);
            await queryClient.invalidateQueries({ queryKey: queryKeys.shop.slots.all });
            router.refresh();
          }}
        />
      )}
    </Card>
  );
}
