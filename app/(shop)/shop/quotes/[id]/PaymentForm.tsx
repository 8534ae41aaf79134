"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { labelOptions } from "@/components/ui/labelOptions";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import type { QuotePayments } from "@/lib/shop/payments/api";
import { amountFieldText } from "@/lib/shop/quotes/money";
import { counterPaymentSchema, refundSchema } from "@/lib/shop/payments/counterSchema";
import { COUNTER_METHODS, PAYMENT_FIELD_LABEL, PAYMENT_METHOD_LABEL } from "@/lib/shop/payments/labels";

type Input = z.input<typeof counterPaymentSchema>;
const METHOD_OPTIONS = labelOptions(PAYMENT_METHOD_LABEL, { values: COUNTER_METHODS });

/**
 * The counter's money form: a payment of the balance taken in cash or by card, or (owner) a
 * refund of the deposit through the provider. Amounts in dollars as typed; the server checks
 * them against what is owed or refundable and answers with the field named.
 */
export function PaymentForm({ quoteId, mode, suggested }: { quoteId: string; mode: "counter" | "refund"; suggested: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const refund = mode === "refund";
  // The refund form has no method; the counter schema's method is filled with "cash" so one form type serves both.
  const schema = refund ? refundSchema.extend({ method: counterPaymentSchema.shape.method }) : counterPaymentSchema;
  const form = useForm<Input, unknown, z.output<typeof counterPaymentSchema>>({
    resolver: zodResolver(schema),
    defaultValues: { amount: suggested, method: "cash" },
  });
  const submit = form.handleSubmit(async (values) => {
    setFailure(null);
    setDone(null);
    try {
      const answer = await api<{ payments: QuotePayments }>(`/api/shop/quotes/${quoteId}/${refund ? "refunds" : "payments"}`, {
        body: refund ? { amount: form.getValues("amount") } : { amount: form.getValues("amount"), method: values.method },
      });
      // The field must never keep the amount just taken or refunded: a second click would take it
      // again. It now offers what is left, as the server just computed it.
      const { invoice } = answer.payments;
      form.reset({ amount: amountFieldText(refund ? invoice.refundableCents : invoice.outstandingCents), method: values.method });
      setDone(
        refund
          ? "Refund sent to the payment provider; it shows as refunded once the provider confirms."
          : "Payment recorded; the customer gets a receipt.",
      );
      router.refresh();
    } catch (e) {
      setFailure(applyFieldErrors(e, form.setError, ["amount", "method"]));
    }
  });
  const label = refund ? PAYMENT_FIELD_LABEL.refundAmount : PAYMENT_FIELD_LABEL.amount;
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(e) => void submit(e)}
      noValidate
      aria-label={refund ? "Refund the deposit" : "Take a payment"}
    >
      <h3 className="font-semibold">{refund ? "Refund the deposit" : "Take the balance at the counter"}</h3>
      <div className="flex flex-wrap items-start gap-3">
        <TextField label={label} inputMode="decimal" {...form.register("amount")} error={form.formState.errors.amount?.message} />
        {!refund && (
          <SelectField
            label={PAYMENT_FIELD_LABEL.method}
            options={METHOD_OPTIONS}
            {...form.register("method")}
            error={form.formState.errors.method?.message}
          />
        )}
      </div>
      <Button type="submit" variant={refund ? "secondary" : "primary"} className="self-start" pending={form.formState.isSubmitting}>
        {refund ? "Refund through the provider" : "Record the payment"}
      </Button>
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
      <div aria-live="polite">{done && <Alert tone="success">{done}</Alert>}</div>
    </form>
  );
}
