/**
 * Test helper for the load-and-pressure properties (loadPressure's and equivalentPressure's tests):
 * a tire on either vehicle class, at a share of its range.
 */
import fc from "fast-check";
import { type LoadPressureBasis, type VehicleKind, loadPressureBasis } from "./loadPressure";
import { real } from "./testUtil";

/**
 * Sizes that carry a load rating, one or more of each kind the load tables treat apart: LT metric
 * in load ranges C, D and E, LT flotation, P-metric standard and extra load, and Euro-metric
 * standard and XL. Both modules' properties run over all of them.
 */
export const LOAD_RATED_TIRES = fc.constantFrom(
  "LT265/75R16 123/120S LRE",
  "LT285/70R17 121/118Q LRC",
  "LT315/70R17 121/118S LRD",
  "37x12.50R17LT 124Q LRD",
  "35x12.50R20LT 121Q LRE",
  "P215/75R15 100S",
  "P265/70R17 113S",
  "P265/70R17 113S XL",
  "265/70R17 115T",
  "245/45R19 102V XL",
);

/** Either vehicle class a tire is rated on. */
export const VEHICLE_KIND = fc.constantFrom<VehicleKind>("passenger-car", "light-truck");

/**
 * Asserts `check` over `numRuns` fast-check runs: a tire drawn from `tires` on either vehicle
 * class, with its load-and-pressure basis there, and a share drawn from [minShare, 1].
 *
 * @example
 * forTireShares(fc.constantFrom("265/70R17 115T"), 0, 100, (tire, vehicle, share, basis) => {
 *   expect(share * basis.maxPressureKpa).toBeLessThanOrEqual(basis.maxPressureKpa);
 * });
 */
export function forTireShares(
  tires: fc.Arbitrary<string>,
  minShare: number,
  numRuns: number,
  check: (tire: string, vehicle: VehicleKind, share: number, basis: LoadPressureBasis) => void,
): void {
  fc.assert(
    fc.property(tires, VEHICLE_KIND, real(minShare, 1), (t, v, share) => check(t, v, share, loadPressureBasis(t, { vehicle: v }))),
    { numRuns },
  );
}
