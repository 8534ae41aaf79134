/**
 * A beadlock ring seen from outside: bolts numbered 1 … n clockwise from the valve stem (top).
 * The bolt number is the big figure inside each bolt, because that is what a technician looks for
 * on the wheel; its step in the tightening order is the small "step n" outside. The first steps
 * are joined to show the crisscross. Bolts ticked off in the pass shown are drawn done, and the
 * next bolt is ringed; on paper (print) every bolt is drawn plain, for ticking by hand.
 *
 * Tapping a bolt ticks it; the tick-off list beside the diagram does the same from the keyboard
 * and for screen readers, so the drawing itself stays one image to assistive technology.
 */
import type { SVGProps } from "react";

const r2 = (v: number): number => Math.round(v * 100) / 100;

const INK = "#181b21"; // basalt-900
const MUTED = "#56616f"; // basalt-500
const EMBER = "#bd460f"; // ember-600
const DONE_FILL = "#dcf3e4"; // clear-100
const DONE_INK = "#14502d"; // clear-800
const DONE_LINE = "#1f7a44"; // clear-600

/** A label centred on a point, across and (by its 0.35em drop) up and down: a bolt's number, its step. */
function CentredText({ label, at, ...rest }: { label: "bolt" | "step"; at: { x: number; y: number } } & SVGProps<SVGTextElement>) {
  return <text data-label={label} x={at.x} y={at.y} dy="0.35em" textAnchor="middle" {...rest} />;
}

export function RingDiagram({
  sequence,
  done,
  next = null,
  onBoltClick,
}: {
  sequence: readonly number[];
  done?: ReadonlySet<number>;
  next?: number | null;
  onBoltClick?: (bolt: number) => void;
}) {
  const n = sequence.length;
  const step = new Map<number, number>();
  sequence.forEach((bolt, i) => step.set(bolt, i + 1));
  const R = 150;
  const pos = (bolt: number, radius = R) => {
    const a = ((bolt - 0.5) / n) * 2 * Math.PI - Math.PI / 2;
    // Rounded: server and browser may differ in the last bit of cos/sin (hydration must match).
    return { x: r2(radius * Math.cos(a)), y: r2(radius * Math.sin(a)), deg: r2((a * 180) / Math.PI) };
  };
  const boltR = r2(Math.min(17, (Math.PI * R) / n - 2));
  const boltFont = r2(Math.max(9, boltR * 1.1));
  // Above 32 bolts "step n" no longer fits across the gap between bolts, so it runs along the radius.
  const radial = n > 32;
  const stepFont = radial ? 7 : n <= 24 ? 12 : 10;
  const joined = sequence.slice(0, Math.min(n, 8));
  return (
    <svg
      viewBox="-240 -252 480 480"
      className="h-auto w-full max-w-md print:max-w-[7cm]"
      role="img"
      aria-labelledby="ring-title ring-desc"
      data-testid="ring-diagram"
      data-bolts={n}
    >
      <title id="ring-title">{`Tightening order of a ${n}-bolt ring`}</title>
      <desc id="ring-desc">{`Bolts numbered clockwise from the valve stem, each marked with its step in the order; order: ${sequence.join(", ")}.`}</desc>
      <circle r={R + 28} fill="none" stroke="#a3acb8" strokeWidth={10} />
      <circle r={R - 28} fill="none" stroke="#a3acb8" strokeWidth={10} />
      {/* valve stem, above the step labels of the bolts either side of it */}
      <g>
        <rect x={-5} y={-R - 80} width={10} height={22} rx={3} fill={INK} />
        <text y={-R - 85} textAnchor="middle" fontSize={13} fill={INK}>
          valve
        </text>
      </g>
      <polyline
        points={joined.map((b) => `${pos(b).x.toFixed(1)},${pos(b).y.toFixed(1)}`).join(" ")}
        fill="none"
        stroke="#e25b16"
        strokeWidth={2}
        strokeDasharray="6 4"
        opacity={0.8}
      />
      {Array.from({ length: n }, (_, i) => i + 1).map((bolt) => {
        const p = pos(bolt);
        const l = pos(bolt, R + 52);
        const s = step.get(bolt) ?? 0;
        const isDone = done?.has(bolt) ?? false;
        const isNext = next === bolt;
        const fill = isNext ? EMBER : isDone ? DONE_FILL : "#ffffff";
        const ink = isNext ? "#ffffff" : isDone ? DONE_INK : INK;
        // Labels on the left half read outward-in, so none is upside down.
        const turn = l.x < 0 ? l.deg + 180 : l.deg;
        return (
          <g
            key={bolt}
            data-testid="ring-bolt"
            data-bolt={bolt}
            data-step={s}
            data-done={isDone}
            data-next={isNext}
            onClick={onBoltClick ? () => onBoltClick(bolt) : undefined}
            className={onBoltClick ? "cursor-pointer" : undefined}
          >
            {isNext && <circle cx={p.x} cy={p.y} r={boltR + 5} fill="none" stroke={EMBER} strokeWidth={3} className="print:hidden" />}
            <circle
              cx={p.x}
              cy={p.y}
              r={boltR}
              fill={fill}
              stroke={isDone ? DONE_LINE : INK}
              strokeWidth={isDone ? 2.5 : 1.5}
              className="print:fill-white print:stroke-basalt-900 print:stroke-[1.5]"
            />
            <CentredText label="bolt" at={p} fontSize={boltFont} fontWeight={800} fill={ink} className="print:fill-basalt-900">
              {bolt}
            </CentredText>
            <CentredText
              label="step"
              at={l}
              fontSize={stepFont}
              fontStyle="italic"
              fill={MUTED}
              transform={radial ? `rotate(${turn} ${l.x} ${l.y})` : undefined}
            >
              {`step ${s}`}
            </CentredText>
          </g>
        );
      })}
      {next !== null && (
        <g className="print:hidden" aria-hidden>
          <text y={-8} textAnchor="middle" fontSize={14} fill={MUTED}>
            next
          </text>
          <text y={22} textAnchor="middle" fontSize={30} fontWeight={800} fill={EMBER}>
            {`bolt ${next}`}
          </text>
        </g>
      )}
    </svg>
  );
}
