import { formatLength } from "@/lib/fitment";

/**
 * "How this is predicted", beside every predictions table (vehicle page and workspace): the
 * model of lib/fitment/clearance.ts and its limits in plain words, the axis's distance in the caller's units. `axisInboardMm` is the steering
 * axis the full-lock points turned about, when the caller placed it from the vehicle.
 */
export function PredictionNote({
  axisInboardMm,
  len = (mm: number) => formatLength(mm, { unit: "mm" }),
}: {
  axisInboardMm?: number | null;
  /** How the axis's distance is written (the reader's units); millimetres when not given. */
  len?: (mm: number) => string;
}) {
  const axis =
    axisInboardMm === undefined || axisInboardMm === null
      ? "through the centre line of the tire each point was measured with (no kingpin inclination or scrub assumed)"
      : `${len(axisInboardMm)} inboard of the hub face at the wheel centre — from the vehicle's kingpin inclination, with zero scrub assumed on the current setup`;
  return (
    <details className="mt-2 rounded-lg bg-basalt-50 p-3 text-sm" data-testid="prediction-note">
      <summary className="cursor-pointer font-semibold">How this is predicted</summary>
      <ul className="mt-2 list-disc space-y-1 pl-5 text-basalt-700">
        <li>
          The tire is taken as a cylinder with square shoulders, its section width on the planned rim by the 0.4 mm per mm of rim width
          rule. The axle does not move when you change tires (the body stays on the same springs and stops), so each part stays put and the
          tire grows or shifts around it.
        </li>
        <li>
          Upward points: the tread rises by half the diameter change. A point measured at full stuff already includes the travel, which the
          swap does not change.
        </li>
        <li>
          Inboard and outboard points: the sidewall moves by the change in reach (offset or backspacing plus half the width change). The
          height of the part is not recorded, so the prediction takes the worst place for it, beside the sidewall or up to 45° over the
          shoulder, where a taller tire&apos;s corner rises toward a fender lip or control arm above it.
        </li>
        <li>Fore/aft points with the wheel straight: half the diameter change, along the radius toward the part.</li>
        <li>
          Full lock: the tread&apos;s corners swing about the steering axis, taken vertical and {axis}. The gap changes by the change in how
          far the facing corner reaches from the axis (inner corner for inboard parts, outer for outboard, the farther one for fore/aft), at
          hub height — a part higher or lower closes faster.
        </li>
        <li>
          Not modelled: caster and kingpin inclination tilting the axis, turning over a bump, the real lock angle (the swing radius is the
          corner&apos;s farthest reach, so lock figures lean cautious), rounder shoulders, lugs and bulge under load.
        </li>
        <li>
          Contact = 0 mm or less, tight = less than the margin, clear = the margin or more. Predictions are a planning aid: test-fit, cycle
          the suspension and turn lock to lock before driving.
        </li>
      </ul>
    </details>
  );
}
