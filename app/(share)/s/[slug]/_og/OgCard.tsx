import type { ComparisonResult } from "@/lib/comparisons/compute";
import { DEFAULT_PREFS, formatLen, formatLenOther, formatNumber, formatSpeedIn } from "@/lib/comparisons/format";
import { readingPhrase } from "@/lib/comparisons/speedometer";
import { OgDrawing } from "./OgDrawing";
import { OgStat } from "./OgStat";
import { EMBER, INK, PAPER, STEEL } from "./palette";

/** The whole image: the shared comparison's title and tires, the drawing, and the headline figures beside it. */
export function OgCard({ r, title }: { r: ComparisonResult; title: string }) {
  const p = DEFAULT_PREFS;
  const len = (mm: number) => formatLen(mm, p, { signed: true, decimals: 2 });
  const speed = r.speedometer.bySystem[p.units];
  const h = speed.headline;
  return (
    <div
      style={{
        width: "100%",
        height: "100%",
        display: "flex",
        flexDirection: "column",
        background: PAPER,
        padding: "40px 56px",
        fontFamily: "Inter",
        color: INK,
      }}
    >
      <div style={{ display: "flex", justifyContent: "space-between", alignItems: "baseline" }}>
        <div style={{ fontFamily: "Archivo", fontSize: 30, fontWeight: 700, color: EMBER }}>Hubface</div>
        <div style={{ fontSize: 22, color: "#56616f" }}>shared comparison</div>
      </div>
      {/* A fixed line height: CJK and Arabic fonts have taller metrics and would push the figures down. */}
      <div
        style={{
          fontFamily: "Archivo",
          fontSize: 50,
          fontWeight: 700,
          lineHeight: 1.25,
          marginTop: 6,
          lineClamp: 1,
          overflow: "hidden",
          whiteSpace: "nowrap",
          textOverflow: "ellipsis",
        }}
      >
        {title}
      </div>
      <div style={{ display: "flex", fontSize: 26, marginTop: 4 }}>
        <span style={{ color: STEEL, fontWeight: 600 }}>{r.current.tireText}</span>
        <span style={{ margin: "0 14px", color: "#56616f" }}>to</span>
        <span style={{ color: EMBER, fontWeight: 600 }}>{r.planned.tireText}</span>
      </div>
      <div style={{ display: "flex", flex: 1, marginTop: 24 }}>
        <div style={{ display: "flex", flexDirection: "column", width: 560, height: 400, background: "#ffffff", borderRadius: 16 }}>
          <OgDrawing r={r} width={560} height={356} />
          <div style={{ display: "flex", fontSize: 18, color: "#434c58", padding: "0 20px", justifyContent: "space-between" }}>
            <span style={{ color: STEEL }}>solid: current</span>
            <span>to scale, from the hub face</span>
            <span style={{ color: EMBER }}>dashed: planned</span>
          </div>
        </div>
        <div style={{ display: "flex", flexWrap: "wrap", marginLeft: 44, width: 520, alignContent: "flex-start" }}>
          <OgStat label="Diameter" value={len(r.changes.diameterMm)} sub={formatLenOther(r.changes.diameterMm, p, { signed: true })} />
          <OgStat label="Poke" value={len(r.changes.outerPokeMm)} sub={formatLenOther(r.changes.outerPokeMm, p, { signed: true })} />
          <OgStat label="Ground clearance" value={len(r.changes.groundClearanceMm)} sub="under the axle" />
          <OgStat
            label={`At ${formatSpeedIn(h.indicated, speed.unit, 0)} shown`}
            value={formatSpeedIn(h.actual, speed.unit)}
            sub={`speedometer ${readingPhrase(r.speedometer.ratio)}`}
          />
          <OgStat
            label="Suggested ratio"
            value={formatNumber(r.gearing.suggestedRatio, 2)}
            sub={`from ${formatNumber(r.gearing.axleRatio, 2)}`}
          />
          <OgStat
            label="Scrub radius"
            value={len(r.changes.scrubRadiusMm)}
            sub={r.kingpinInclinationDeg === null ? "wheel shift only" : `${formatNumber(r.kingpinInclinationDeg, 1)}° KPI`}
          />
        </div>
      </div>
    </div>
  );
}
