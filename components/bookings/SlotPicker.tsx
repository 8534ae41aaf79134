"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { ApiError, api } from "@/lib/platform/client/api";
import type { SlotsAnswer } from "@/lib/shop/bookings/api";
import { BAY_KIND_LABEL, START_FIELD_LABELS } from "@/lib/shop/bookings/vocabulary";
import { addDays, formatDuration } from "@/lib/shop/bookings/zoned";
import { queryKeys } from "@/lib/platform/query/keys";

interface Props {
  /** GET endpoint answering SlotsAnswer (`?from=YYYY-MM-DD&days=7`). */
  slotsUrl: string;
  /** The button's words for the chosen time, e.g. "Book 8:00 AM, Monday, March 15". */
  actionLabel: (slot: string) => string;
  /** Books (or moves to) the start; throws ApiError with the server's field errors. */
  onPick: (start: string) => Promise<void>;
  /** Keeps the ids of two pickers on one page apart. */
  idPrefix: string;
}

/**
 * The free starts of a booking's work (an install, or the re-check), a week at a time on the shop's clock, as one radio group; the chosen
 * start goes to `onPick`. The server checks it again (and PostgreSQL last), so a start taken in
 * the meantime comes back as a message beside the group and the list reloads.
 */
export function SlotPicker({ slotsUrl, actionLabel, onPick, idPrefix }: Props) {
  const [from, setFrom] = useState<string | null>(null);
  const [chosen, setChosen] = useState<{ start: string; words: string } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const slots = useQuery({
    queryKey: queryKeys.shop.slots.week(slotsUrl, from),
    queryFn: () => api<SlotsAnswer>(`${slotsUrl}?days=7${from ? `&from=${from}` : ""}`),
    placeholderData: keepPreviousData,
  });
  const errorId = `${idPrefix}-start-error`;
  // The field is named after what is booked (an install, or the re-check), as the server's messages name it.
  const fieldLabel = START_FIELD_LABELS[slots.data?.kind ?? "install"];
  const submit = async () => {
    if (!chosen) {
      setError(`${fieldLabel}: pick one of the offered times.`);
      return;
    }
    setError(null);
    setPending(true);
    try {
      await onPick(chosen.start);
    } catch (e) {
      setError(e instanceof ApiError ? (e.body.fieldErrors?.start?.[0] ?? e.message) : "Something went wrong. Try again.");
      setChosen(null);
      await slots.refetch();
    }
    setPending(false);
  };
  if (slots.isError) return <Alert tone="error">{(slots.error as Error).message}</Alert>;
  const data = slots.data;
  if (!data)
    return (
      <p className="text-sm text-basalt-600" aria-live="polite">
        Loading free times…
      </p>
    );
  if (data.unavailable) return <Alert tone="warning">{data.unavailable}</Alert>;
  const first = data.days[0]?.date;
  const open = data.days.some((d) => d.slots.length > 0);
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-basalt-700">
        The work keeps the truck about <strong>{data.length}</strong>
        {data.segments.length > 1 &&
          ` (${data.segments.map((s) => `${BAY_KIND_LABEL[s.bayKind].toLowerCase()} ${formatDuration(s.minutes)}`).join(", then ")})`}
        . Times are on the shop&apos;s clock ({data.timeZone}).
      </p>
      <fieldset aria-describedby={errorId} aria-invalid={error ? true : undefined} className="flex flex-col gap-3">
        <legend className="text-sm font-medium text-basalt-800">{fieldLabel}</legend>
        {!open && <p className="text-sm text-basalt-600">No free time in these days: try later days.</p>}
        {data.days.map((d) => (
          <div key={d.date} data-testid="slot-day">
            <p className="text-sm font-semibold">
              {d.label}
              {d.closed && (
                <span className="ml-2 font-normal text-basalt-500">{d.closed === "Closed" ? "closed" : `closed: ${d.closed}`}</span>
              )}
              {!d.closed && d.slots.length === 0 && <span className="ml-2 font-normal text-basalt-500">fully booked</span>}
            </p>
            <div className="mt-1 flex flex-wrap gap-2">
              {d.slots.map((s) => {
                const words = `${s.label}, ${d.label}`;
                const id = `${idPrefix}-${s.start}`;
                return (
                  <label
                    key={s.start}
                    htmlFor={id}
                    className="flex min-h-10 cursor-pointer items-center gap-2 rounded-lg px-3 py-2 text-sm ring-1 ring-inset ring-basalt-300 has-[:checked]:bg-basalt-900 has-[:checked]:text-white"
                  >
                    <input
                      id={id}
                      type="radio"
                      name={`${idPrefix}-start`}
                      value={s.start}
                      checked={chosen?.start === s.start}
                      onChange={() => setChosen({ start: s.start, words })}
                      className="sr-only"
                    />
                    <span>{s.label}</span>
                    <span className="sr-only">, {d.label}</span>
                  </label>
                );
              })}
            </div>
          </div>
        ))}
        <p id={errorId} aria-live="polite" className="text-sm text-contact-600">
          {error}
        </p>
      </fieldset>
      <div className="flex flex-wrap gap-2">
        <Button
          type="button"
          variant="secondary"
          disabled={!first || first <= data.today || slots.isFetching}
          onClick={() => setFrom(addDays(first!, -7) > data.today ? addDays(first!, -7) : null)}
        >
          Earlier days
        </Button>
        <Button type="button" variant="secondary" disabled={!first || slots.isFetching} onClick={() => setFrom(addDays(first!, 7))}>
          Later days
        </Button>
        <Button type="button" pending={pending} onClick={() => void submit()}>
          {chosen ? actionLabel(chosen.words) : "Book the chosen time"}
        </Button>
      </div>
    </div>
  );
}
