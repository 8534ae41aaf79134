import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { labelOptions } from "@/components/ui/labelOptions";
import { TextField } from "@/components/ui/TextField";
import { Segmented } from "@/components/comparison/Segmented";
import { TORQUE_UNIT_SYMBOL, formatTorqueEntry, type TorqueUnit } from "@/lib/fitment";
import { otherUnit } from "./torqueText";
import type { TorqueField } from "./useTorqueEntry";

const COMMON_COUNTS = [16, 24, 30, 32];

/** Bolt count, the maker's torque with its unit switch, and the print button. Not printed. */
export function RingInputs({
  countText,
  onCountText,
  countError,
  torque,
}: {
  countText: string;
  onCountText: (text: string) => void;
  countError?: string;
  torque: TorqueField;
}) {
  const other = otherUnit(torque.unit);
  const hint =
    torque.nm !== null
      ? `= ${formatTorqueEntry(torque.nm, other)} ${TORQUE_UNIT_SYMBOL[other]}`
      : "Printed in the ring maker's instructions";
  return (
    <Card className="no-print">
      <div className="flex flex-wrap items-end gap-4">
        <TextField
          className="w-40"
          label="Bolts on the ring"
          name="ring-bolts"
          inputMode="numeric"
          value={countText}
          onChange={(e) => onCountText(e.target.value)}
          error={countError}
          hint={`Common: ${COMMON_COUNTS.join(", ")}`}
        />
        <TextField
          className="w-56"
          label={torque.label}
          name="ring-torque"
          inputMode="decimal"
          autoComplete="off"
          value={torque.text}
          placeholder="from the maker"
          onChange={(e) => torque.setText(e.target.value)}
          error={torque.error}
          hint={hint}
        />
        <Segmented<TorqueUnit>
          legend="Torque unit"
          name="ring-unit"
          value={torque.unit}
          options={labelOptions(TORQUE_UNIT_SYMBOL)}
          onChange={torque.switchUnit}
          className="mb-6"
        />
      </div>
      <Button type="button" variant="secondary" className="mt-1" onClick={() => window.print()}>
        Print this sheet
      </Button>
    </Card>
  );
}
