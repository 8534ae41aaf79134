/**
 * The owner's re-check slot length, as the re-checks page's form and its route accept it. Plain
 * data and zod, safe for the browser; messages name the field as the form labels it.
 */
import { z } from "zod";
import { RECHECK_SLOT_LIMITS } from "./recheckLink";

/** The field's label on the re-checks page. */
export const RECHECK_SLOT_FIELD_LABEL = "Re-check slot (minutes)";

const RANGE = `${RECHECK_SLOT_FIELD_LABEL}: use ${RECHECK_SLOT_LIMITS.min} to ${RECHECK_SLOT_LIMITS.max} minutes.`;
const WHOLE = `${RECHECK_SLOT_FIELD_LABEL}: enter a whole number of minutes, e.g. 30.`;

/** `minutes` as typed ("45") or sent (45); a fraction or text is refused rather than rounded. */
export const recheckSlotSchema = z.object({
  minutes: z.coerce
    .number({ error: WHOLE })
    .refine((n) => Number.isFinite(n), WHOLE)
    .refine((n) => Number.isInteger(n), WHOLE)
    .refine((n) => n >= RECHECK_SLOT_LIMITS.min && n <= RECHECK_SLOT_LIMITS.max, RANGE),
});
