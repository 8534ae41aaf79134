"use client";
import { createContext, useContext } from "react";
import type { HeaderProps } from "react-big-calendar";
import { dayOf } from "./bayEvents";

/** The shown days the shop is closed ("YYYY-MM-DD"); the calendar passes its headers no data of ours. */
export const ClosedDays = createContext<ReadonlySet<string>>(new Set());

/** A day's column header, saying when the shop is closed that day (the grid also greys it). */
export function DayHeader({ date, label }: HeaderProps) {
  const closed = useContext(ClosedDays).has(dayOf(date));
  return (
    <span>
      {label}
      {closed && <span className="ml-1 font-normal text-basalt-600">closed</span>}
    </span>
  );
}
