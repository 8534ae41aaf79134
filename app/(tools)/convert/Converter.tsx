"use client";
import { useState } from "react";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { formatNumber } from "@/lib/comparison/format";
import { equivalentSizes, formatLength, ftLbToNm, mmToIn, nmToFtLb, parseLength, parseTireSize } from "@/lib/fitment";
import { convertPressure } from "@/lib/fitment/pressure";
import { LinkedFields, type LinkedUnit } from "./LinkedFields";

const trim = (n: number, decimals: number) => String(Number(n.toFixed(decimals)));
const plainNumber = (text: string): number | null => {
  const t = text.trim().replace(/\u2212/g, "-");
  return /^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t) ? Number(t) : null;
};

const LENGTH: LinkedUnit[] = [
  { key: "mm", label: "Millimetres", read: (t) => parseLength(t, "mm"), show: (mm) => trim(mm, 2), error: "Enter a length like 120.65 (or 4-3/4 in).", hint: "e.g. 120.65" },
  {
    key: "in",
    label: "Inches",
    read: (t) => parseLength(t, "in"),
    show: (mm) => trim(mmToIn(mm), 4),
    extra: (mm) => `≈ ${formatLength(mm, { unit: "in", fraction: 16 })} (nearest 1/16)`,
    error: "Enter inches like 4-3/4, 4 3/4 or 4.75.",
    hint: "Fractions work: 4-3/4",
  },
  { key: "cm", label: "Centimetres", read: (t) => parseLength(/[a-z"”]/i.test(t) ? t : `${t.trim()} cm`, "mm"), show: (mm) => trim(mm / 10, 3), error: "Enter a length like 12.07.", hint: "e.g. 12.07" },
];

const PRESSURE: LinkedUnit[] = [
  { key: "psi", label: "psi", read: (t) => { const v = plainNumber(t); return v === null ? null : convertPressure(v, "psi", "kPa"); }, show: (k) => trim(convertPressure(k, "kPa", "psi"), 2), error: "Enter a pressure like 35.", hint: "e.g. 35" },
  { key: "kpa", label: "kPa", read: plainNumber, show: (k) => trim(k, 1), error: "Enter a pressure like 241.", hint: "e.g. 241" },
  { key: "bar", label: "bar", read: (t) => { const v = plainNumber(t); return v === null ? null : convertPressure(v, "bar", "kPa"); }, show: (k) => trim(convertPressure(k, "kPa", "bar"), 3), error: "Enter a pressure like 2.4.", hint: "e.g. 2.4" },
];

const TORQUE: LinkedUnit[] = [
  { key: "ftlb", label: "ft·lb", read: (t) => { const v = plainNumber(t); return v === null ? null : ftLbToNm(v); }, show: (nm) => trim(nmToFtLb(nm), 2), error: "Enter a torque like 100.", hint: "e.g. 100" },
  { key: "nm", label: "N·m", read: plainNumber, show: (nm) => trim(nm, 2), error: "Enter a torque like 135.6.", hint: "e.g. 135.6" },
];

function TireSizes() {
  const [text, setText] = useState("37x12.50R17LT");
  const [sameRim, setSameRim] = useState(true);
  let size: ReturnType<typeof parseTireSize> | null = null;
  let error: string | undefined;
  try {
    size = parseTireSize(text);
  } catch (e) {
    error = e instanceof Error ? e.message : "Not a tire size (e.g. 265/70R17).";
  }
  const list = size ? equivalentSizes(size, { sameRimDiameter: sameRim, limit: 6 }) : [];
  const target = size?.system === "metric" ? "inch (flotation)" : "metric";
  return (
    <Card>
      <h2 className="text-lg font-semibold">Tire sizes, inch ⇄ metric</h2>
      <p className="mb-3 text-sm text-basalt-600">The nearest standard sizes of the other system, by overall diameter, then section width.</p>
      <div className="flex flex-wrap items-end gap-4">
        <TextField className="min-w-0 flex-1 basis-64" label="Tire size" name="convert-tire" autoComplete="off" spellCheck={false} value={text} onChange={(e) => setText(e.target.value)} error={error} hint={size ? `Reads as ${size.text}: ${formatNumber(size.overallDiameterMm, 1)} mm (${formatNumber(mmToIn(size.overallDiameterMm), 2)} in) tall, ${formatNumber(size.sectionWidthMm, 1)} mm wide` : "e.g. 285/75R17 or 35x12.50R17LT"} />
        <label className="mb-7 flex items-center gap-2 text-sm">
          <input type="checkbox" className="size-4 accent-ember-600" checked={sameRim} onChange={(e) => setSameRim(e.target.checked)} />
          Same rim diameter only
        </label>
      </div>
      <div className="mt-2 min-h-64 overflow-x-auto" tabIndex={0} role="region" aria-label="Equivalent sizes (scrolls sideways on narrow screens)">
        {size && (
          <table className="w-full min-w-[22rem] text-sm tabular-nums" data-testid="equivalents">
            <caption className="mb-1 text-left text-sm font-medium text-basalt-700">Nearest {target} sizes to {size.text}</caption>
            <thead>
              <tr className="border-b border-basalt-200 text-left">
                <th scope="col" className="py-1.5 pr-3">Size</th>
                <th scope="col" className="py-1.5 pr-3 text-right">Diameter</th>
                <th scope="col" className="py-1.5 pr-3 text-right">Δ diameter</th>
                <th scope="col" className="py-1.5 text-right">Δ width</th>
              </tr>
            </thead>
            <tbody>
              {list.map((e) => (
                <tr key={e.text} className="border-b border-basalt-100">
                  <th scope="row" className="py-1.5 pr-3 text-left font-semibold">{e.text}</th>
                  <td className="py-1.5 pr-3 text-right">{formatNumber(e.size.overallDiameterMm, 1)} mm · {formatNumber(mmToIn(e.size.overallDiameterMm), 2)} in</td>
                  <td className="py-1.5 pr-3 text-right">{formatNumber(e.diameterDeltaMm, 1, { signed: true })} mm ({formatNumber(e.diameterDeltaPct, 1, { signed: true })} %)</td>
                  <td className="py-1.5 text-right">{formatNumber(e.widthDeltaMm, 1, { signed: true })} mm</td>
                </tr>
              ))}
              {list.length === 0 && (
                <tr>
                  <td colSpan={4} className="py-3 text-basalt-500">No standard size of the other system for this rim diameter; clear “same rim diameter only”.</td>
                </tr>
              )}
            </tbody>
          </table>
        )}
      </div>
      <p className="mt-2 text-xs text-basalt-500">Standard sizes are generated by rule (not a catalogue); check what is actually made in a size before you count on it.</p>
    </Card>
  );
}

export function Converter() {
  return (
    <div className="flex flex-col gap-5">
      <TireSizes />
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
        <p className="mt-2 text-xs text-basalt-500">Lug nut and ring bolt figures come from the wheel or vehicle maker; this only converts them.</p>
      </Card>
    </div>
  );
}
