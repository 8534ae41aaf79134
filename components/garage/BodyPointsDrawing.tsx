/**
 * Where to measure the body points: a side view of a truck (front to the left) on level ground,
 * with each figure the load profile asks for drawn as a dimension. Plain SVG, no data: the same
 * drawing for every vehicle. Heights go from the ground up to the lowest point of the part; the
 * distances run level from the axle's centre line.
 */
const GROUND = 220;
const FRONT_AXLE = 160;
const REAR_AXLE = 460;
const R = 48;
const CORNER_FRONT = { x: 48, y: 150 };
const CORNER_REAR = { x: 590, y: 142 };
const MID = { x: (FRONT_AXLE + REAR_AXLE) / 2, y: 170 };

function Arrow({ x1, y1, x2, y2 }: { x1: number; y1: number; x2: number; y2: number }) {
  return (
    <line x1={x1} y1={y1} x2={x2} y2={y2} stroke="currentColor" strokeWidth={1.5} markerStart="url(#bp-tip)" markerEnd="url(#bp-tip)" />
  );
}

export function BodyPointsDrawing() {
  return (
    <svg
      viewBox="0 0 640 300"
      role="img"
      aria-labelledby="bp-title bp-desc"
      className="h-auto w-full max-w-xl text-basalt-800"
      data-testid="body-points-drawing"
    >
      <title id="bp-title">Where to measure the body points</title>
      <desc id="bp-desc">
        Side view of a truck on level ground, front to the left. Front corner height: from the ground up to the lowest point of the front
        overhang. Front corner ahead of the front axle: level distance from the front axle&apos;s centre to that point. Rear corner height
        and rear corner behind the rear axle: the same at the back. Wheelbase: from axle centre to axle centre. Lowest point midway: from
        the ground up to the lowest part of the underbody halfway between the axles.
      </desc>
      <defs>
        <marker id="bp-tip" viewBox="0 0 10 10" refX="5" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
          <path d="M0,0 L10,5 L0,10 z" fill="currentColor" />
        </marker>
      </defs>
      {/* Ground */}
      <line x1={10} y1={GROUND} x2={630} y2={GROUND} stroke="currentColor" strokeWidth={2} />
      {/* Body: overhangs, cab and bed, underbody dipping to the lowest point midway */}
      <path
        d={`M${CORNER_FRONT.x},${CORNER_FRONT.y} L${CORNER_FRONT.x},95 L200,80 L250,30 L340,30 L350,80 L${CORNER_REAR.x},80 L${CORNER_REAR.x},${CORNER_REAR.y} L${REAR_AXLE + 70},${CORNER_REAR.y} L${REAR_AXLE + 60},150 L${REAR_AXLE - 60},150 L${MID.x + 40},160 L${MID.x},${MID.y} L${MID.x - 40},160 L${FRONT_AXLE + 60},150 L${FRONT_AXLE - 60},150 L${FRONT_AXLE - 70},${CORNER_FRONT.y} Z`}
        fill="#e8e4dc"
        stroke="currentColor"
        strokeWidth={1.5}
      />
      {/* Wheels, centres marked */}
      {[FRONT_AXLE, REAR_AXLE].map((x) => (
        <g key={x}>
          <circle cx={x} cy={GROUND - R} r={R} fill="#3b3a36" />
          <circle cx={x} cy={GROUND - R} r={R * 0.45} fill="#bcb6aa" />
          <line x1={x} y1={GROUND - R - 62} x2={x} y2={GROUND + 40} stroke="currentColor" strokeDasharray="4 3" />
        </g>
      ))}
      {/* Measured points */}
      {[CORNER_FRONT, CORNER_REAR, MID].map((p) => (
        <circle key={p.x} cx={p.x} cy={p.y} r={4} fill="#c2410c" />
      ))}
      {/* Heights */}
      <Arrow x1={CORNER_FRONT.x - 18} y1={GROUND} x2={CORNER_FRONT.x - 18} y2={CORNER_FRONT.y} />
      <text x={14} y={GROUND - 40} fontSize={11} transform={`rotate(-90 14 ${GROUND - 40})`}>
        front height
      </text>
      <Arrow x1={CORNER_REAR.x + 18} y1={GROUND} x2={CORNER_REAR.x + 18} y2={CORNER_REAR.y} />
      <text x={CORNER_REAR.x + 34} y={GROUND - 8} fontSize={11} transform={`rotate(-90 ${CORNER_REAR.x + 34} ${GROUND - 8})`}>
        rear height
      </text>
      <Arrow x1={MID.x} y1={GROUND} x2={MID.x} y2={MID.y} />
      <text x={MID.x + 8} y={GROUND - 12} fontSize={11}>
        lowest point midway
      </text>
      {/* Distances from the axles */}
      <Arrow x1={CORNER_FRONT.x} y1={GROUND + 18} x2={FRONT_AXLE} y2={GROUND + 18} />
      <text x={CORNER_FRONT.x + 6} y={GROUND + 34} fontSize={11}>
        ahead of the front axle
      </text>
      <Arrow x1={REAR_AXLE} y1={GROUND + 18} x2={CORNER_REAR.x} y2={GROUND + 18} />
      <text x={REAR_AXLE + 6} y={GROUND + 34} fontSize={11}>
        behind the rear axle
      </text>
      <Arrow x1={FRONT_AXLE} y1={GROUND + 52} x2={REAR_AXLE} y2={GROUND + 52} />
      <text x={MID.x - 30} y={GROUND + 70} fontSize={11}>
        wheelbase
      </text>
    </svg>
  );
}
