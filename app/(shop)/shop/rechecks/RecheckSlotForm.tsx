"use client";
import { RECHECK_SLOT, RECHECK_SLOT_LIMITS } from "@/lib/shop/workOrders/recheckLink";
import { RECHECK_SLOT_FIELD_LABEL, recheckSlotSchema } from "@/lib/shop/workOrders/recheckSlotSchema";
import { NumberSettingForm } from "./NumberSettingForm";

/** The owner's re-check length: the slots the customer's re-check page offers, and what a moved re-check holds. */
export function RecheckSlotForm({ minutes }: { minutes: number }) {
  return (
    <NumberSettingForm
      className="mt-5"
      name="minutes"
      value={minutes}
      label={RECHECK_SLOT_FIELD_LABEL}
      hint={`${RECHECK_SLOT_LIMITS.min} to ${RECHECK_SLOT_LIMITS.max}; ${RECHECK_SLOT.minutes} unless you set it (common practice, no source)`}
      schema={recheckSlotSchema}
      url="/api/shop/rechecks/slot"
      saved={(n) => `Saved: the re-check page offers ${n}-minute slots.`}
    />
  );
}
