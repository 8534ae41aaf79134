import type { ComparisonResult } from "@/lib/comparisons/compute";
import { type DisplayPrefs, formatNumber, formatPartThickness } from "@/lib/comparisons/format";
import type { CrossSectionModel } from "@/lib/fitment/crossSection";
import { len, offsetText, signedLen } from "@/lib/comparisons/crossSection/text";

const STATUS = { clear: "clear", tight: "closer than the margin", contact: "predicted contact" } as const;
const NOT_DRAWN = {
  "fore-aft": "not in this section (ahead of or behind the tire)",
  "full-lock": "not in this section (measured at full lock)",
} as const;

/**
 * The drawing's figures as tables, for screen readers (visually hidden; the picture itself is one
 * image with a title and a description). Same figures, same units as the labels.
 */
export function CrossSectionTable({
  id,
  r,
  model,
  prefs,
}: {
  id: string;
  r: ComparisonResult;
  model: CrossSectionModel;
  prefs: DisplayPrefs;
}) {
  const sides = ["current", "planned"] as const;
  const rows: [string, (side: (typeof sides)[number]) => string][] = [
    ["Tire", (s) => r[s].tireText],
    ["Wheel", (s) => `${r[s].wheelDiameterIn} × ${r[s].wheelWidthIn} in`],
    ["Offset (rim centreline to mounting face)", (s) => offsetText(r[s].offsetMm)],
    [
      "Backspacing",
      (s) =>
        `${len(model[s].backspacing.valueMm, prefs)} to the ${model[s].backspacing.reference === "flange" ? "flange edge" : "bead seat"}`,
    ],
    ["Flange allowance", (s) => len(model[s].flange.allowanceMm, prefs)],
    ["Spacer", (s) => (r[s].spacerMm > 0 ? formatPartThickness(r[s].spacerMm, prefs) : "none")],
    ["Section width on this rim", (s) => len(r[s].sectionWidthMm, prefs)],
    ["Sidewall height", (s) => len(r[s].sidewallMm, prefs)],
    ["Overall diameter", (s) => len(r[s].overallDiameterMm, prefs)],
    ["Reach inboard of the hub face", (s) => len(r[s].innerSwingMm, prefs)],
    ["Reach outboard of the hub face", (s) => len(r[s].outerSwingMm, prefs)],
  ];
  const g = model.groundChangeMm;
  const limits = model.limits.map(
    (l) =>
      [
        l.id === "inner-limit"
          ? "Inner limit (nearest inboard part)"
          : l.id === "fender-lip"
            ? "Fender lip (nearest outboard part)"
            : "Fender line (entered)",
        `${len(Math.abs(l.x), prefs)} ${l.x < 0 ? "inboard" : "outboard"} of the hub face`,
      ] as const,
  );
  return (
    <div className="sr-only" data-testid="cross-section-table">
      <table>
        <caption>Figures drawn in the cross-section</caption>
        <thead>
          <tr>
            <th scope="col">Figure</th>
            <th scope="col">Current</th>
            <th scope="col">Planned</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, value]) => (
            <tr key={label}>
              <th scope="row">{label}</th>
              {sides.map((s) => (
                <td key={s}>{value(s)}</td>
              ))}
            </tr>
          ))}
          <tr>
            <th scope="row">Ground clearance change</th>
            <td colSpan={2}>{g === 0 ? "none" : `${signedLen(g, prefs)} (the planned setup sits ${g > 0 ? "higher" : "lower"})`}</td>
          </tr>
        </tbody>
      </table>
      {(limits.length > 0 || model.parts.length > 0 || model.steeringAxis) && (
        <table id={`${id}-vehicle`}>
          <caption>Vehicle parts and lines drawn</caption>
          <thead>
            <tr>
              <th scope="col">Part or line</th>
              <th scope="col">Where</th>
            </tr>
          </thead>
          <tbody>
            {limits.map(([label, where]) => (
              <tr key={label}>
                <th scope="row">{label}</th>
                <td>{where}</td>
              </tr>
            ))}
            {model.parts.map((p) => (
              <tr key={p.id}>
                <th scope="row">{p.label}</th>
                <td>
                  {p.at
                    ? `${p.direction === "upward" ? `${len(p.distanceMm, prefs)} above the tread it was measured with` : `${len(Math.abs(p.at.x), prefs)} ${p.at.x < 0 ? "inboard" : "outboard"} of the hub face at hub height`}; ${len(p.predictedMm, prefs)} predicted with the planned setup, ${STATUS[p.status]}`
                    : `${NOT_DRAWN[p.notDrawn!]}; ${len(p.predictedMm, prefs)} predicted with the planned setup, ${STATUS[p.status]}`}
                </td>
              </tr>
            ))}
            {model.steeringAxis && (
              <tr>
                <th scope="row">Steering axis</th>
                <td>{`${formatNumber(model.steeringAxis.deg, 1)}° kingpin inclination, through the current tire's contact centre (zero scrub assumed), ${len(Math.abs(model.steeringAxis.atAxle.x), prefs)} inboard of the hub face at axle height`}</td>
              </tr>
            )}
          </tbody>
        </table>
      )}
    </div>
  );
}
