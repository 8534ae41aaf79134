import { INK } from "./palette";

/** One headline figure on the image: its name, its value large, and a line under it. */
export function OgStat({ label, value, sub }: { label: string; value: string; sub: string }) {
  return (
    <div style={{ display: "flex", flexDirection: "column", width: 250, marginBottom: 18 }}>
      <div style={{ fontSize: 20, fontWeight: 600, color: "#56616f", textTransform: "uppercase", letterSpacing: 1 }}>{label}</div>
      <div style={{ fontFamily: "Archivo", fontSize: 46, fontWeight: 700, color: INK }}>{value}</div>
      <div style={{ fontSize: 20, color: "#434c58" }}>{sub}</div>
    </div>
  );
}
