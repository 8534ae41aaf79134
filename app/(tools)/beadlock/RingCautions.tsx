import { Alert } from "@/components/ui/Alert";

/**
 * The usual cautions for beadlock rings and bead seating. Shown on screen and on the printed sheet
 * (the sheet goes to the wheel; the screen may not).
 */
export function RingCautions({ className }: { className?: string }) {
  return (
    <div data-testid="ring-cautions" className={className}>
      <Alert
        tone="warning"
        title="Before you start — the makers' instructions come first"
        className="print:bg-white print:py-2 print:text-xs print:leading-snug print:ring-basalt-400"
      >
        <ul className="mt-1 list-disc space-y-1 pl-5 print:space-y-0.5">
          <li>The wheel and ring maker&apos;s torque figure, tightening order, bolts and lubrication govern over anything on this page.</li>
          <li>Tighten ring bolts in passes, in a crisscross, so the ring pulls down evenly; never run one bolt straight to full torque.</li>
          <li>
            Never exceed the maker&apos;s torque figure: an over-tightened bolt can stretch or snap. Use a torque wrench that is in
            calibration.
          </li>
          <li>
            Re-check every ring bolt after the first run (the first few miles), after every time you air down, and at the intervals the
            maker gives.
          </li>
          <li>
            Seat beads in a safety cage, or with a clip-on air chuck and an in-line gauge while you stand clear — never lean over a tire
            being inflated.
          </li>
          <li>
            Never exceed the bead-seating pressure printed on the sidewall. If the bead will not seat at that pressure, deflate and find out
            why.
          </li>
          <li>Defer to the makers, local rules and licensed practice: when in doubt, have a qualified tire shop do it.</li>
        </ul>
      </Alert>
    </div>
  );
}
