import { type FigureColumn, FigureTable } from "@/components/ui/FigureTable";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { type DisplayPrefs, formatNumber, formatPartThickness } from "@/lib/comparisons/format";
import type { CrossSectionModel } from "@/lib/fitment/crossSection";
import { len, offsetText, signedLen } from "@/lib/comparisons/crossSection/text";

const STATUS = { clear: "clear", tight: "closer than the margin", contact: "predicted contact" } as const;
const NOT_DRAWN = {
  "fore-aft": "not in this section (ahead of or behind the tire)",
  "full-lock": "not in this section (measured at full lock)",
} as const;

/** A row of the vehicle table: the part or line, and where it is. */
type Place = { key: string; label: string; where: string };
const PLACE_COLUMNS: FigureColumn<Place>[] = [
  { id: "part", header: "Part or line", cell: (p) => p.label },
  { id: "where", header: "Where", cell: (p) => p.where },
];
/** A row of the figures table: the figure, and its text for either setup. */
type FigureRow = [string, (side: "current" | "planned") => string];
const FIGURE_COLUMNS: FigureColumn<FigureRow>[] = [
  { id: "figure", header: "Figure", cell: ([label]) => label },
  { id: "current", header: "Current", cell: ([, value]) => value("current") },
  { id: "planned", header: "Planned", cell: ([, value]) => value("planned") },
];

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
  const rows: FigureRow[] = [
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
  const limits = model.limits.map((l): Place => {
    const label =
      l.id === "inner-limit"
        ? "Inner limit (nearest inboard part)"
        : l.id === "fender-lip"
          ? "Fender lip (nearest outboard part)"
          : "Fender line (entered)";
    return { key: label, label, where: `${len(Math.abs(l.x), prefs)} ${l.x < 0 ? "inboard" : "outboard"} of the hub face` };
  });
  const parts = model.parts.map((p): Place => ({
    key: p.id,
    label: p.label,
    where: p.at
      ? `${p.direction === "upward" ? `${len(p.distanceMm, prefs)} above the tread it was measured with` : `${len(Math.abs(p.at.x), prefs)} ${p.at.x < 0 ? "inboard" : "outboard"} of the hub face at hub height`}; ${len(p.predictedMm, prefs)} predicted with the planned setup, ${STATUS[p.status]}`
      : `${NOT_DRAWN[p.notDrawn!]}; ${len(p.predictedMm, prefs)} predicted with the planned setup, ${STATUS[p.status]}`,
  }));
  const axis = model.steeringAxis;
  const steering: Place[] = axis
    ? [
        {
          key: "steering-axis",
          label: "Steering axis",
          where: `${formatNumber(axis.deg, 1)}° kingpin inclination, through the current tire's contact centre (zero scrub assumed), ${len(Math.abs(axis.atAxle.x), prefs)} inboard of the hub face at axle height`,
        },
      ]
    : [];
  const places = [...limits, ...parts, ...steering];
  return (
    <div className="sr-only" data-testid="cross-section-table">
      <FigureTable
        look="bare"
        caption="Figures drawn in the cross-section"
        columns={FIGURE_COLUMNS}
        rows={rows}
        rowKey={([label]) => label}
        footRows={
          <tr>
            <th scope="row">Ground clearance change</th>
            <td colSpan={2}>{g === 0 ? "none" : `${signedLen(g, prefs)} (the planned setup sits ${g > 0 ? "higher" : "lower"})`}</td>
          </tr>
        }
      />
      {places.length > 0 && (
        <FigureTable
          look="bare"
          id={`${id}-vehicle`}
          caption="Vehicle parts and lines drawn"
          columns={PLACE_COLUMNS}
          rows={places}
          rowKey={(p) => p.key}
        />
      )}
    </div>
  );
}
