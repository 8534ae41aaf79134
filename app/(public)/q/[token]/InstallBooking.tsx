"use client";
import { useRouter } from "next/navigation";
import { LinkBooking } from "@/components/bookings/LinkBooking";
import type { Booking } from "@/lib/shop/bookings/api";

/** After the deposit: the customer picks the install time on their link, or sees the one booked. */
export function InstallBooking({ token, booking, shopName }: { token: string; booking: Booking | null; shopName: string }) {
  const router = useRouter();
  return (
    <LinkBooking
      title="Install time"
      base={`/api/q/${token}`}
      booking={booking}
      changeNote={`To move or cancel it, call ${shopName}.`}
      idPrefix="q"
      onBooked={() => router.refresh()}
    />
  );
}
