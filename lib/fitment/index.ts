/**
 * Hubface fitment engine — public entry point. Pure, deterministic, SI (mm) inside.
 * See README.md in this folder for conventions, formulas and sources.
 *
 * Server code may import from here. Client code on a page's first load imports from the engine
 * module itself (`@/lib/fitment/offset`, ...): package.json sets no "sideEffects", so the bundler
 * keeps every module this file names, load-and-pressure, finder and torque tables included
 * (≈ 9 kB gzip of the workspace's first load; README.md "Performance").
 */
export { FitmentInputError, TireSizeError, TireLimitError, BodyPointError } from "./errors";
export {
  MM_PER_IN,
  MM_PER_MILE,
  KM_PER_MILE,
  STANDARD_GRAVITY,
  inToMm,
  mmToIn,
  psiToKpa,
  kpaToPsi,
  ftLbToNm,
  nmToFtLb,
  KG_PER_LB,
  kgToLb,
  lbToKg,
} from "./units";
// convertPressure (lib/fitment/pressure.ts) is imported from its own module, not from here: it
// brings convert-units, which pages using only the engine should not download.
export { LOAD_INDEX_KG, MAX_LOAD_INDEX, SPEED_SYMBOL_KMH, loadIndexKg, speedSymbolKmh, isSpeedSymbol } from "./loadSpeed";
export { LOAD_RANGES, loadRangeInfo, loadRangeFromPly, plyRating, isLoadRange, type LoadRange, type LoadRangeInfo } from "./loadRange";
export {
  NUMERIC_ASPECT_RATIO,
  parseTireSize,
  formatTireSize,
  toTireSize,
  type TireSize,
  type TireSystem,
  type ServiceType,
  type Construction,
  type TireMarking,
} from "./tireSize";
export {
  LOAD_PRESSURE_EXPONENT,
  PASSENGER_ON_LIGHT_TRUCK_DIVISOR,
  PASSENGER_REFERENCE_KPA,
  PASSENGER_MAX_INFLATION_KPA,
  ROAD_MINIMUM_KPA,
  ROAD_MINIMUM_RATIO,
  LOAD_PRESSURE_LIMITS,
  loadAtPressure,
  pressureForLoad,
  loadPressureBasis,
  loadIndexNeeded,
  type LoadIndexNeeded,
  type TireLoadClass,
  type VehicleKind,
  type LoadPressureOptions,
  type LoadPressureSources,
  type LoadPressureBasis,
  type LoadAtPressure,
  type PressureForLoad,
} from "./loadPressure";
export { equivalentPressure, type EquivalentPressureInput, type EquivalentPressure } from "./equivalentPressure";
export {
  TRAIL_ANGLE_LIMITS_MM,
  approachAngleDeg,
  departureAngleDeg,
  breakoverAngleDeg,
  raiseBodyPoint,
  type CornerInput,
  type BreakoverInput,
  type RaiseInput,
} from "./trailAngles";
export {
  SECTION_WIDTH_K,
  RIM_WIDTH_TOLERANCE_IN,
  RIM_WIDTH_LIMITS_IN,
  tireDimensions,
  measuringRimWidthIn,
  measuringRimFactor,
  approvedRimWidthRangeIn,
  sectionWidthOnRimMm,
  nominalSize,
  formatNominalInchSize,
  type TireDimensions,
  type NominalSize,
} from "./dimensions";
export {
  DEFAULT_FLANGE_IN,
  FLANGE_ALLOWANCE_LIMITS_IN,
  OFFSET_MARGIN_MM,
  offsetFromBackspacing,
  backspacingFromOffset,
  checkOffsetMm,
  checkWheelWidthIn,
  type BackspacingReference,
} from "./offset";
export { WHEEL_DIAMETER_LIMITS_IN, SPACER_LIMITS_MM, setupGeometry, type Wheel, type SetupInput, type SetupGeometry } from "./geometry";
export {
  RPM_CONSTANT,
  COMMON_AXLE_RATIOS,
  DEFAULT_SPEEDS_MPH,
  DEFAULT_AXLE_RATIO,
  DEFAULT_TRANSMISSION_RATIO,
  DEFAULT_KPI_DEG,
  CORNER_MASS_LIMITS_KG,
  compareSetups,
  crawlRatio,
  effectiveCrawlRatio,
  engineRpm,
  type CompareOptions,
  type SetupLike,
  type SetupComparison,
  type CornerMass,
  type RotatingMassComparison,
} from "./compare";
// Every name of the torque module is public (values, parsing and the tightening plan).
export * from "./tightening";
export { parseLength, formatLength, type LengthUnit } from "./length";
export { commaRefusal, hasNumberComma } from "./commaEntry";
export {
  BOLT_PATTERN_TOLERANCE_MM,
  parseBoltPattern,
  formatBoltPattern,
  toBoltPattern,
  boltPatternsEquivalent,
  type BoltPattern,
} from "./boltPattern";
export {
  METRIC_ASPECT_BAND,
  METRIC_DIAMETER_WINDOW_MM,
  FLOTATION_DESIGNATIONS,
  STANDARD_METRIC_SIZES,
  STANDARD_FLOTATION_SIZES,
  STANDARD_SIZES,
  standardSizes,
} from "./standardSizes";
export {
  equivalentSizes,
  equivalentDistance,
  EQUIVALENT_WEIGHTS,
  type EquivalentSize,
  type EquivalentOptions,
  type EquivalentRim,
} from "./equivalents";
export {
  DEFAULT_WHEEL_WIDTHS_IN,
  COMMON_OFFSETS_MM,
  findFitments,
  type FitmentConstraints,
  type WheelOffer,
  type FinderOptions,
  type FitmentMatch,
  type FitmentCandidate,
  type FitmentExclusion,
  type ExclusionReason,
  type FinderResult,
} from "./finder";
export {
  CLEARANCE_DIRECTIONS,
  DEFAULT_CLEARANCE_MARGIN_MM,
  CLEARANCE_MARGIN_LIMITS_MM,
  CLEARANCE_DISTANCE_LIMITS_MM,
  CLEARANCE_HEIGHT_LIMITS_MM,
  SUSPENSION_STATES,
  STEERING_AXIS_LIMITS_MM,
  SCRUB_RADIUS_LIMITS_MM,
  classifyClearance,
  clearanceChangeMm,
  clearanceEnvelope,
  steeringAxisInboardMm,
  prepareClearance,
  predictPreparedMm,
  predictClearance,
  predictClearances,
  clearanceLimits,
  type ClearanceDirection,
  type ClearanceStatus,
  type ClearanceBasis,
  type ClearanceEnvelope,
  type ClearanceOptions,
  type SuspensionState,
  type MeasuredClearance,
  type PreparedClearance,
  type ClearancePrediction,
  type ClearanceLimits,
} from "./clearance";
