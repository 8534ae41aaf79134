/**
 * The wheel columns of a catalog row, checked through the fitment engine, with every problem in
 * words for the person who made the file (the engine's own messages name its internal fields).
 */
import { FitmentInputError, checkOffsetMm, checkWheelWidthIn, offsetFromBackspacing, parseBoltPattern } from "@/lib/fitment";
import { BACKSPACING_REFERENCES, type BackspacingReference } from "@/lib/setup/model";
import type { CatalogInput, CsvColumn } from "./csv";

type WheelFields = Pick<
  CatalogInput,
  | "wheel_diameter_in"
  | "wheel_width_in"
  | "wheel_offset_mm"
  | "wheel_backspacing_in"
  | "wheel_backspacing_reference"
  | "bolt_pattern"
  | "center_bore_mm"
  | "beadlock"
>;

/**
 * Reads the wheel cells (`v` gives a trimmed cell) into `item`; each problem goes to `fail` with
 * its column. The engine is told the field's name as people read it ("Wheel width", "Offset"),
 * so its range messages read as sentences about the cell.
 */
export function readWheelCells(
  v: (c: CsvColumn) => string,
  fail: (column: CsvColumn, message: string) => void,
  item: WheelFields,
  asWritten: (c: CsvColumn) => string = (c) => c,
): void {
  /** A number cell: empty and non-numbers are refused here, the range is the caller's. */
  const number = (c: CsvColumn, label: string, example: string): number | null => {
    const t = v(c);
    if (t === "") return (fail(c, `${label} is empty; enter a number, e.g. ${example}.`), null);
    const n = Number(t);
    if (!Number.isFinite(n)) return (fail(c, `${label} must be a number, e.g. ${example}; got “${t}”.`), null);
    return n;
  };
  const ranged = (c: CsvColumn, label: string, min: number, max: number, example: string): number | null => {
    const n = number(c, label, example);
    if (n !== null && (n < min || n > max)) return (fail(c, `${label} must be from ${min} to ${max}, e.g. ${example}; got ${n}.`), null);
    return n;
  };
  const engine = (c: CsvColumn, run: () => void) => {
    try {
      run();
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      fail(c, e.message.endsWith(".") ? e.message : `${e.message}.`);
    }
  };

  item.wheel_diameter_in = ranged("wheel_diameter_in", "Wheel diameter (in)", 8, 30, "17");
  let width: number | null = null;
  const widthIn = number("wheel_width_in", "Wheel width (in)", "9");
  if (widthIn !== null) engine("wheel_width_in", () => (width = item.wheel_width_in = checkWheelWidthIn(widthIn, "Wheel width")));

  const offText = v("wheel_offset_mm");
  const bsText = v("wheel_backspacing_in");
  const refColumn = asWritten("wheel_backspacing_reference");
  const ref = v("wheel_backspacing_reference").toLowerCase();
  if (offText && bsText) fail("wheel_offset_mm", "Give the offset or the backspacing, not both.");
  else if (!offText && !bsText) fail("wheel_offset_mm", `Give the offset (mm) or the backspacing (in) with ${refColumn}.`);
  else if (offText) {
    const offset = number("wheel_offset_mm", "Offset (mm)", "-12");
    if (offset !== null && width !== null)
      engine("wheel_offset_mm", () => (item.wheel_offset_mm = checkOffsetMm(offset, width!, "Offset")));
  } else {
    const bs = number("wheel_backspacing_in", "Backspacing (in)", "4.5");
    if (!(BACKSPACING_REFERENCES as readonly string[]).includes(ref))
      fail("wheel_backspacing_reference", `Say where the backspacing was measured to: ${BACKSPACING_REFERENCES.join(" or ")}.`);
    else if (bs !== null && width !== null) {
      try {
        const reference = ref as BackspacingReference;
        item.wheel_offset_mm = offsetFromBackspacing({ widthIn: width, backspacingIn: bs, measuredFrom: reference });
        item.wheel_backspacing_in = bs;
        item.wheel_backspacing_reference = reference;
      } catch (e) {
        if (!(e instanceof FitmentInputError)) throw e;
        // The engine refuses a backspacing that puts the mounting face past a bead seat (or outside −10…30 in).
        fail(
          "wheel_backspacing_in",
          `Backspacing ${bs} in, measured to the ${ref}, does not fit a ${width} in wide wheel. Check the number and ${refColumn}.`,
        );
      }
    }
  }

  const bp = v("bolt_pattern");
  if (!bp) fail("bolt_pattern", "Enter the bolt pattern, e.g. 6x5.5 or 8x165.1.");
  else engine("bolt_pattern", () => (item.bolt_pattern = parseBoltPattern(bp).text));
  if (v("center_bore_mm")) item.center_bore_mm = ranged("center_bore_mm", "Centre bore (mm)", 40, 200, "108");
  const bl = v("beadlock").toLowerCase();
  if (["yes", "y", "true", "1"].includes(bl)) item.beadlock = true;
  else if (["", "no", "n", "false", "0"].includes(bl)) item.beadlock = false;
  else fail("beadlock", `Beadlock must be yes or no, got “${v("beadlock")}”.`);
}
