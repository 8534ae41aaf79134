"use client";
import { Card } from "@/components/ui/Card";
import {
  TORQUE_UNIT_SYMBOL,
  type TorqueUnit,
  formatLength,
  mmToIn,
  parseLength,
  parseTorqueEntry,
  torqueFromNm,
  torqueToNm,
} from "@/lib/fitment";
import { type PressureUnit, convertPressure } from "@/lib/fitment/pressure";
import { LinkedFields, type LinkedUnit } from "./LinkedFields";
import { TireSizeEquivalents } from "./TireSizeEquivalents";

const trim = (n: number, decimals: number) => String(Number(n.toFixed(decimals)));
const plainNumber = (text: string): number | null => {
  const t = text.trim().replace(/\u2212/g, "-");
  return /^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t) ? Number(t) : null;
};

const LENGTH: LinkedUnit[] = [
  {
    key: "mm",
    label: "Millimetres",
    read: (t) => parseLength(t, "mm"),
    show: (mm) => trim(mm, 2),
    error: "enter a length like 120.65 (or 4-3/4 in).",
    hint: "e.g. 120.65",
  },
  {
    key: "in",
    label: "Inches",
    read: (t) => parseLength(t, "in"),
    show: (mm) => trim(mmToIn(mm), 4),
    extra: (mm) => `≈ ${formatLength(mm, { unit: "in", fraction: 16 })} (nearest 1/16)`,
    error: "enter inches like 4-3/4, 4 3/4 or 4.75.",
    hint: "Fractions work: 4-3/4",
  },
  {
    key: "cm",
    label: "Centimetres",
    read: (t) => parseLength(/[a-z"”]/i.test(t) ? t : `${t.trim()} cm`, "mm"),
    show: (mm) => trim(mm / 10, 3),
    error: "enter a length like 12.07.",
    hint: "e.g. 12.07",
  },
];

/** A pressure field in one unit; the fields share the figure in kPa. */
const pressureUnit = (key: string, unit: PressureUnit, decimals: number, example: string): LinkedUnit => ({
  key,
  label: `Pressure (${unit})`,
  read: (t) => {
    const v = plainNumber(t);
    return v === null ? null : convertPressure(v, unit, "kPa");
  },
  show: (k) => trim(convertPressure(k, "kPa", unit), decimals),
  error: `enter a pressure like ${example}.`,
  hint: `e.g. ${example}`,
});

const PRESSURE: LinkedUnit[] = [
  pressureUnit("psi", "psi", 2, "35"),
  pressureUnit("kpa", "kPa", 1, "241"),
  pressureUnit("bar", "bar", 3, "2.4"),
];

/**
 * Torque goes through the engine's torque entry (the same reading as the tightening tools): a
 * decimal comma, a range or the other unit's figure is refused with a message naming the field,
 * never guessed at. 1 ft·lbf = 1.355818 N·m (NIST SP 811).
 */
const torqueUnit = (unit: TorqueUnit, example: string, decimals: number): LinkedUnit => {
  const label = `Torque (${TORQUE_UNIT_SYMBOL[unit]})`;
  return {
    key: unit,
    label,
    read: (t) => torqueToNm(parseTorqueEntry(t, unit, label), unit),
    show: (nm) => trim(torqueFromNm(nm, unit), decimals),
    error: `enter a torque like ${example}.`,
    readSaysWhy: true,
    hint: `e.g. ${example}`,
  };
};
const TORQUE: LinkedUnit[] = [torqueUnit("ftlb", "100", 2), torqueUnit("nm", "135.6", 2)];

export function Converter() {
  return (
    <div className="flex flex-col gap-5">
      <TireSizeEquivalents />
      <Card>
        <h2 className="mb-3 text-lg font-semibold">Lengths</h2>
        <LinkedFields idPrefix="length" units={LENGTH} initial={{ key: "in", text: "4-3/4" }} />
        <p className="mt-2 text-xs text-basalt-500">1 in = 25.4 mm exactly.</p>
      </Card>
      <Card>
        <h2 className="mb-3 text-lg font-semibold">Pressure</h2>
        <LinkedFields idPrefix="pressure" units={PRESSURE} initial={{ key: "psi", text: "35" }} />
      </Card>
      <Card>
        <h2 className="mb-3 text-lg font-semibold">Torque</h2>
        <LinkedFields idPrefix="torque" units={TORQUE} initial={{ key: "ftlb", text: "100" }} />
        <p className="mt-2 text-xs text-basalt-500">
          Lug nut and ring bolt figures come from the wheel or vehicle maker; this only converts them.
        </p>
      </Card>
    </div>
  );
}
