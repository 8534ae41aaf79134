import type { BackspacingReference } from "@/lib/setup/model";
import { BACKSPACING_DIAGRAM_BOX } from "./backspacingDiagramBox";

/**
 * A small schematic of a wheel's inboard half: backspacing measured from the mounting face to the
 * bead seat, or to the flange edge (the bead-seat figure plus the flange allowance).
 */
export function BackspacingDiagram({ reference }: { reference: BackspacingReference }) {
  const flange = reference === "flange";
  const on = "#bd460f";
  const off = "#a3acb8";
  return (
    <svg
      {...BACKSPACING_DIAGRAM_BOX}
      role="img"
      aria-label={
        flange
          ? "Backspacing measured from the mounting face to the flange edge, which includes the flange allowance"
          : "Backspacing measured from the mounting face to the bead seat"
      }
    >
      {/* rim profile: flange edge, bead seat, barrel, mounting face */}
      <path d="M 20 58 Q 20 36 44 36 L 200 36" fill="none" stroke="#353c46" strokeWidth="3" />
      <line x1="170" x2="170" y1="36" y2="86" stroke="#181b21" strokeWidth="3" />
      <text x="174" y="84" fontSize="10" fill="#181b21">
        face
      </text>
      <line x1="44" x2="44" y1="30" y2="42" stroke="#353c46" strokeWidth="1.5" />
      <text x="30" y="76" fontSize="10" fill="#353c46">
        flange
      </text>
      <text x="46" y="50" fontSize="10" fill="#353c46">
        bead seat
      </text>
      {/* bead-seat measurement */}
      <g stroke={flange ? off : on} fill={flange ? off : on}>
        <line x1="44" x2="170" y1="22" y2="22" strokeWidth="2" strokeDasharray={flange ? "4 3" : undefined} />
        <path d="M 44 22 l 6 -4 v 8 z M 170 22 l -6 -4 v 8 z" stroke="none" />
      </g>
      {/* flange-edge measurement */}
      <g stroke={flange ? on : off} fill={flange ? on : off}>
        <line x1="20" x2="170" y1="8" y2="8" strokeWidth="2" strokeDasharray={flange ? undefined : "4 3"} />
        <path d="M 20 8 l 6 -4 v 8 z M 170 8 l -6 -4 v 8 z" stroke="none" />
      </g>
      <line x1="20" x2="20" y1="4" y2="58" stroke={off} strokeWidth="1" strokeDasharray="2 2" />
      <text x="92" y="19" fontSize="9" fill={flange ? off : on}>
        to bead seat
      </text>
      <text x="84" y="5.5" fontSize="9" fill={flange ? on : off}>
        to flange edge
      </text>
    </svg>
  );
}
