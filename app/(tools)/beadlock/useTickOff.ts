"use client";
import { useState } from "react";

interface TickState {
  /** The ring the ticks belong to (bolt count and exact torque); null when there is no plan. */
  key: string | null;
  /** Bolts ticked, per pass (index 0 = pass 1). */
  done: number[][];
  /** The pass the person chose to look at; null follows progress (the first pass not finished). */
  view: number | null;
  /** Ticks were dropped because the ring changed; said until the next tick or reset. */
  cleared: boolean;
}

export interface TickOff {
  /** Index of the pass shown. */
  pass: number;
  /** Bolts ticked in the pass shown. */
  done: ReadonlySet<number>;
  /** Whether each pass is finished. */
  complete: boolean[];
  /** First bolt of the order not yet ticked in the pass shown; null when that pass is finished. */
  next: number | null;
  allDone: boolean;
  cleared: boolean;
  toggle: (bolt: number) => void;
  markNext: () => void;
  select: (pass: number) => void;
  reset: () => void;
  /** The ticks and the ring they belong to, to remember; null when nothing is ticked. */
  saved: { key: string; done: number[][] } | null;
  /** Puts back remembered ticks; they stay only if `key` is the ring shown once the inputs are back too. */
  restore: (saved: { key: string; done: number[][] }) => void;
}

/**
 * Which bolts a technician has ticked off, pass by pass. The ticks belong to one ring: `key` names
 * the bolt count and the exact torque (a unit switch keeps it, so the ticks survive). Another count
 * or another real torque makes them meaningless — bolts done to 18 ft·lb are not done to 20 — so
 * they are cleared, and the person is told.
 */
export function useTickOff(key: string | null, sequence: readonly number[], passCount: number): TickOff {
  const [state, setState] = useState<TickState>({ key, done: [], view: null, cleared: false });
  let s = state;
  if (state.key !== key) {
    // Adjusting state to a changed input during render (React: "storing information from previous renders").
    s = { key, done: [], view: null, cleared: state.cleared || state.done.some((d) => d.length > 0) };
    setState(s);
  }
  const doneIn = (i: number) => new Set(s.done[i] ?? []);
  const complete = Array.from({ length: passCount }, (_, i) => sequence.length > 0 && sequence.every((b) => doneIn(i).has(b)));
  const firstOpen = complete.indexOf(false);
  const pass = s.view ?? (firstOpen === -1 ? Math.max(0, passCount - 1) : firstOpen);
  const done = doneIn(pass);
  const next = sequence.find((b) => !done.has(b)) ?? null;

  const toggle = (bolt: number) => {
    const set = doneIn(pass);
    if (set.has(bolt)) set.delete(bolt);
    else set.add(bolt);
    const lists = Array.from({ length: passCount }, (_, i) => (i === pass ? sequence.filter((b) => set.has(b)) : (s.done[i] ?? [])));
    const finished = sequence.every((b) => set.has(b));
    // Finishing the pass being looked at hands over to the next unfinished one.
    setState({ key, done: lists, view: finished ? null : s.view, cleared: false });
  };

  return {
    pass,
    done,
    complete,
    next,
    allDone: firstOpen === -1 && passCount > 0,
    cleared: s.cleared,
    toggle,
    markNext: () => {
      if (next !== null) toggle(next);
    },
    select: (i) => setState({ ...s, view: i }),
    reset: () => setState({ key, done: [], view: null, cleared: false }),
    saved: s.key !== null && s.done.some((d) => d.length > 0) ? { key: s.key, done: s.done } : null,
    restore: (saved) => setState({ key: saved.key, done: saved.done, view: null, cleared: false }),
  };
}
