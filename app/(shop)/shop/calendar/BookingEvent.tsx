import type { EventProps } from "react-big-calendar";
import type { BayEvent } from "./bayEvents";

/**
 * A booking's words inside its event. The calendar makes the event a focusable button whose
 * name is its time and these words, so the bay and the day are said too (the grid shows them by
 * position only).
 */
export function BookingEvent({ event }: EventProps<BayEvent>) {
  return (
    <span data-testid="calendar-booking">
      <span className="block font-semibold">
        Q-{event.booking.quoteNumber} · {event.booking.customerName}
      </span>
      <span className="block">{event.booking.vehicleDescription}</span>
      <span className="sr-only">
        , {event.stretch.bayName}, {event.start.toLocaleDateString("en-US", { weekday: "long", month: "long", day: "numeric" })}
      </span>
    </span>
  );
}
