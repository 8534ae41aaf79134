"use client";
import type { VehicleKind } from "@/lib/fitment";
import { Segmented } from "./Segmented";

/**
 * Truck or car: a passenger tire's load is divided by 1.10 on a light truck (the engine's rule),
 * so the choice changes the pressure. Used by the workspace's load panel and the garage's placard form.
 */
export function VehicleKindChoice({ name, value, onChange }: { name: string; value: VehicleKind; onChange: (v: VehicleKind) => void }) {
  return (
    <Segmented<VehicleKind>
      legend="Vehicle"
      name={name}
      value={value}
      options={[
        { value: "light-truck", label: "Truck, SUV, van" },
        { value: "passenger-car", label: "Car" },
      ]}
      onChange={onChange}
    />
  );
}
