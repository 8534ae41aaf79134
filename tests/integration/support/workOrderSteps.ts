/** A valid sign-off body for each step (figures typed as a technician would). */
export function bodyFor(position: string, step: string): object {
  const readings = { camberLeft: "-0.25", camberRight: "-0.5", casterLeft: "3.5", casterRight: "3.75", toeTotal: "0.1" };
  switch (step) {
    case "fitted":
      return { position, step, dotCode: "2325", tire: "35x12.50R17 example tire", wheel: "17x9 beadlock wheel" };
    case "match_mount":
      return { position, step, method: "uniformity_to_low_point" };
    case "beadlock":
      return { position, step, ringBolts: "24", torque: "17", unit: "ftlb", passesDone: true };
    case "bead_seat":
      return { position, step, acknowledged: true };
    case "pressure":
      // Above the quoted 35x12.50R17LT load range E's road minimum, 0.5833 × 65 = 37.9 psi (the engine's ratio, no source).
      return { position, step, pressure: "40", pressureUnit: "psi" };
    case "balance":
      return { position, step, innerGrams: "42.5", outerGrams: "0" };
    case "lug_torque":
      return { position, step, torque: "190", unit: "nm", passesDone: true };
    case "alignment":
      return { position, step, before: readings, after: { ...readings, toeTotal: "0.05" } };
    default:
      return { position, step, trimmed: true, note: "Front bumper corners" };
  }
}
