"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ApiError, api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { Booking } from "@/lib/shop/bookings/api";
import { type BayEvent, movedRequest } from "./bayEvents";

export type MoveMessage = { tone: "success" | "error"; text: string };

/** Where a dragged event is drawn while the server decides. */
export interface DraggedTo {
  id: string;
  start: Date;
  end: Date;
  resourceId: string;
}

export const MOVED = "Moved; the customer is e-mailed the updated calendar entry.";
export const CANCELLED = "Booking cancelled; the customer's calendar entry is withdrawn by e-mail.";

/** The server's own words for a refused move (taken, outside hours, closed day, wrong bay). */
export function refusalText(e: unknown): string {
  if (!(e instanceof ApiError)) return "Something went wrong. Try again.";
  const fields = e.body.fieldErrors ?? {};
  return fields.start?.[0] ?? fields.bayId?.[0] ?? e.message;
}

/** A booking of either kind (install or re-check) on the counter's booking route. */
export const bookingUrl = (bookingId: string) => `/api/shop/bookings/${bookingId}`;

/** Sends a booking to another start (and bay) through the counter's move route, which checks it again. */
export const putMove = (bookingId: string, body: { start: string; bayId?: string }) =>
  api<{ booking: Booking }>(bookingUrl(bookingId), { method: "PUT", body });

/** Cancels a booking through the counter's route; the customer's calendar entry is withdrawn. */
export const deleteBooking = (bookingId: string) => api<{ booking: Booking }>(bookingUrl(bookingId), { method: "DELETE" });

/**
 * A drop on the calendar: the event is drawn where it was dropped until the server answers; a
 * refusal puts it back (nothing is drawn over the server's answer) and says why, a move reloads
 * the calendar (and any open free-time list) from the server.
 */
export function useBookingMove(timeZone: string) {
  const queryClient = useQueryClient();
  const [dragged, setDragged] = useState<DraggedTo | null>(null);
  const [message, setMessage] = useState<MoveMessage | null>(null);
  const refresh = () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: queryKeys.shop.calendar.all }),
      queryClient.invalidateQueries({ queryKey: queryKeys.shop.slots.all }),
    ]);
  /** After a move or a cancel the server made: says so and reloads the calendar and free times. */
  const moved = async (text: string = MOVED) => {
    setMessage({ tone: "success", text });
    await refresh();
  };
  const drop = async (event: BayEvent, droppedAt: Date, resourceId: string | undefined, isAllDay = false) => {
    if (dragged) return;
    if (isAllDay) {
      setMessage({ tone: "error", text: "Drop the booking on a time of day, not on the day's header." });
      return;
    }
    const bayId = resourceId ?? event.resourceId;
    const body = movedRequest(event, droppedAt, bayId, timeZone);
    const length = event.end.getTime() - event.start.getTime();
    setMessage(null);
    setDragged({ id: event.id, start: droppedAt, end: new Date(droppedAt.getTime() + length), resourceId: bayId });
    try {
      await putMove(event.booking.id, body);
      await moved();
    } catch (e) {
      setMessage({ tone: "error", text: `Not moved: ${refusalText(e)}` });
    }
    setDragged(null);
  };
  /** The events as drawn: the dragged one where it was dropped, on the shop's clock. */
  const place = (events: BayEvent[]) =>
    dragged
      ? events.map((e) => (e.id === dragged.id ? { ...e, start: dragged.start, end: dragged.end, resourceId: dragged.resourceId } : e))
      : events;
  return { drop, moved, place, message, setMessage, pending: dragged !== null };
}
