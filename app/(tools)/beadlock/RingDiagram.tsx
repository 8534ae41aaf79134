/**
 * A beadlock ring seen from outside: bolts numbered 1 … n clockwise from the valve stem (top),
 * each showing its step in the tightening order; the first steps are joined to show the
 * crisscross pattern.
 */
const r2 = (v: number): number => Math.round(v * 100) / 100;

export function RingDiagram({ sequence }: { sequence: number[] }) {
  const n = sequence.length;
  const step = new Map<number, number>();
  sequence.forEach((bolt, i) => step.set(bolt, i + 1));
  const R = 150;
  const pos = (bolt: number) => {
    const a = ((bolt - 0.5) / n) * 2 * Math.PI - Math.PI / 2;
    // Rounded: server and browser may differ in the last bit of cos/sin (hydration must match).
    return { x: r2(R * Math.cos(a)), y: r2(R * Math.sin(a)), a };
  };
  const boltR = r2(Math.min(15, (Math.PI * R) / n - 2));
  const joined = sequence.slice(0, Math.min(n, 8));
  return (
    <svg viewBox="-215 -232 430 447" className="h-auto w-full max-w-md" role="img" aria-labelledby="ring-title ring-desc" data-testid="ring-diagram" data-bolts={n}>
      <title id="ring-title">{`Tightening order of a ${n}-bolt ring`}</title>
      <desc id="ring-desc">{`Bolts numbered clockwise from the valve stem; order: ${sequence.join(", ")}.`}</desc>
      <circle r={R + 28} fill="none" stroke="#a3acb8" strokeWidth={10} />
      <circle r={R - 28} fill="none" stroke="#a3acb8" strokeWidth={10} />
      {/* valve stem */}
      <g>
        <rect x={-5} y={-R - 58} width={10} height={22} rx={3} fill="#181b21" />
        <text y={-R - 62} textAnchor="middle" fontSize={13} fill="#181b21">valve</text>
      </g>
      <polyline points={joined.map((b) => `${pos(b).x.toFixed(1)},${pos(b).y.toFixed(1)}`).join(" ")} fill="none" stroke="#e25b16" strokeWidth={2} strokeDasharray="6 4" opacity={0.8} />
      {Array.from({ length: n }, (_, i) => i + 1).map((bolt) => {
        const p = pos(bolt);
        const s = step.get(bolt) ?? 0;
        const first = s <= 4;
        const lx = r2((R + 50) * Math.cos(p.a));
        const ly = r2((R + 50) * Math.sin(p.a));
        return (
          <g key={bolt} data-testid="ring-bolt" data-bolt={bolt} data-step={s}>
            <circle cx={p.x} cy={p.y} r={boltR} fill={first ? "#bd460f" : "#ffffff"} stroke="#181b21" strokeWidth={1.5} />
            <text x={p.x} y={p.y} dy="0.35em" textAnchor="middle" fontSize={r2(Math.max(9, boltR * 0.95))} fontWeight={700} fill={first ? "#ffffff" : "#181b21"}>
              {s}
            </text>
            <text x={lx} y={ly} dy="0.35em" textAnchor="middle" fontSize={n > 24 ? 9 : 11} fill="#56616f">
              {bolt}
            </text>
          </g>
        );
      })}
      <text y={-6} textAnchor="middle" fontSize={14} fill="#353c46">
        inside: step
      </text>
      <text y={12} textAnchor="middle" fontSize={14} fill="#353c46">
        outside: bolt no.
      </text>
    </svg>
  );
}
