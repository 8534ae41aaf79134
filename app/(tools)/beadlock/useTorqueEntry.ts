"use client";
import { useState } from "react";
import { FitmentInputError } from "@/lib/fitment";
import { TORQUE_UNIT_SYMBOL, requireTorqueNm, switchTorqueUnit, torqueEntryNm, type TorqueEntry, type TorqueUnit } from "@/lib/fitment";

/** The torque field's label in a unit; messages name the field by this same text. */
export const torqueLabel = (unit: TorqueUnit): string => `Maker's torque (${TORQUE_UNIT_SYMBOL[unit]})`;

export interface TorqueField {
  text: string;
  unit: TorqueUnit;
  label: string;
  /** The figure in N·m when the field holds one accepted figure, else null. */
  nm: number | null;
  error?: string;
  setText: (text: string) => void;
  switchUnit: (to: TorqueUnit) => void;
  /** The entry as it stands (text, unit and the exact value behind a converted text), to remember. */
  entry: TorqueEntry;
  /** Puts back a remembered entry. */
  restore: (entry: TorqueEntry) => void;
}

/**
 * State of a torque field with a unit switch. Switching converts the figure and keeps the exact
 * value behind the rounded text (lib/fitment/tightening: switchTorqueUnit), so a technician never
 * sees the same digits relabelled in another unit. A figure that cannot be read keeps its unit:
 * relabelling it would turn "16-18 ft·lb" into a N·m entry the person never made.
 */
export function useTorqueEntry(initialUnit: TorqueUnit = "ftlb"): TorqueField {
  const [entry, setEntry] = useState<TorqueEntry>({ text: "", unit: initialUnit, exact: null });
  const [refusedSwitch, setRefusedSwitch] = useState(false);
  const label = torqueLabel(entry.unit);

  let nm: number | null = null;
  let error: string | undefined;
  try {
    const read = torqueEntryNm(entry, label);
    nm = read === null ? null : requireTorqueNm(read, entry.unit, label);
  } catch (e) {
    error = e instanceof FitmentInputError ? e.message : `${label}: enter the maker's figure as one number`;
  }
  if (error && refusedSwitch) error += `. The unit stays ${TORQUE_UNIT_SYMBOL[entry.unit]} until this reads as one figure.`;

  return {
    text: entry.text,
    unit: entry.unit,
    label,
    nm,
    error,
    // Typing replaces the converted text, so the exact value behind it no longer applies.
    setText: (text) => {
      setEntry({ text, unit: entry.unit, exact: null });
      setRefusedSwitch(false);
    },
    entry,
    restore: (remembered) => {
      setEntry(remembered);
      setRefusedSwitch(false);
    },
    switchUnit: (to) => {
      try {
        setEntry(switchTorqueUnit(entry, to, label));
        setRefusedSwitch(false);
      } catch {
        setRefusedSwitch(true);
      }
    },
  };
}
