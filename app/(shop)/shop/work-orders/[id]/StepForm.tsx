"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMemo, useState } from "react";
import { type Resolver, useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import type { StepPosition } from "@/lib/platform/db/types";
import type { WorkOrder } from "@/lib/shop/workOrders/api";
import { signStepSchemaFor } from "@/lib/shop/workOrders/schema";
import type { StepKind } from "@/lib/shop/workOrders/vocabulary";
import { StepFields } from "./StepFields";
import { type StepValues, emptyStep, fieldPaths } from "./stepForm";

/**
 * Signs one step off. The schema is the route's own; the form sends the text as typed and the
 * server reads it again (units converted there), so the browser and the server cannot disagree
 * on what a figure means; both hold the pressure to the quoted tire's limits by the same rule.
 * Who and when come from the session, never from the form.
 */
export function StepForm({
  workOrder,
  position,
  step,
  onSigned,
}: {
  workOrder: WorkOrder;
  position: StepPosition;
  step: StepKind;
  onSigned: (w: WorkOrder) => void;
}) {
  const defaults = emptyStep(step, position, workOrder);
  // The schema's input is a union of every step's fields; this form holds one of them.
  const schema = useMemo(() => signStepSchemaFor(workOrder.pressureLimits), [workOrder.pressureLimits]);
  const form = useForm<StepValues>({ resolver: zodResolver(schema) as unknown as Resolver<StepValues>, defaultValues: defaults });
  const [failure, setFailure] = useState<string | null>(null);
  const submit = form.handleSubmit(async () => {
    setFailure(null);
    try {
      const r = await api<{ workOrder: WorkOrder }>(`/api/shop/work-orders/${workOrder.id}/steps`, {
        method: "PUT",
        body: form.getValues(),
      });
      onSigned(r.workOrder);
    } catch (e) {
      setFailure(applyFieldErrors(e, form.setError, fieldPaths(defaults)));
    }
  });
  return (
    <form
      className="flex flex-col gap-3 print:hidden"
      onSubmit={(e) => void submit(e)}
      noValidate
      aria-label={`Sign off ${position} ${step}`}
    >
      <StepFields
        form={form}
        step={step}
        idPrefix={`${position}-${step}`}
        lugCount={workOrder.lugCount}
        pressureLimits={workOrder.pressureLimits}
      />
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
      <Button type="submit" className="self-start" pending={form.formState.isSubmitting}>
        Sign off
      </Button>
    </form>
  );
}
