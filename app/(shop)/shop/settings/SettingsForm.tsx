"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { type ShopSettings, type ShopSettingsInput, shopSettingsSchema } from "@/lib/shop/schema";

const FIELDS = [
  "name",
  "address",
  "phone",
  "taxRate",
  "labourRate",
  "fabricationRate",
  "quoteValidityDays",
  "depositPct",
  "currency",
  "noticeEmail",
] as const;

export function SettingsForm({ initial }: { initial: Record<(typeof FIELDS)[number], string> }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const form = useForm<ShopSettingsInput, unknown, ShopSettings>({
    resolver: zodResolver(shopSettingsSchema),
    defaultValues: initial as ShopSettingsInput,
  });
  const { handleSubmit, setError, formState, getValues } = form;
  const field = fieldBinder(form);
  const onSubmit = handleSubmit(async () => {
    setMessage(null);
    // The text as typed goes to the server, which parses it with the same schema.
    const body = getValues();
    try {
      await api("/api/shop/settings", { method: "PUT", body });
      setMessage({ tone: "success", text: "Settings saved. New quotes use them from now on." });
      router.refresh();
    } catch (e) {
      const rest = applyFieldErrors(e, setError, FIELDS);
      if (rest) setMessage({ tone: "error", text: rest });
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <div aria-live="polite">{message && <Alert tone={message.tone}>{message.text}</Alert>}</div>
      <TextField label="Shop name" {...field("name")} />
      <TextField label="Address" {...field("address")} hint="Printed in the quote header." />
      <TextField label="Phone" type="tel" {...field("phone")} />
      <TextField
        label="E-mail for shop notices"
        type="email"
        {...field("noticeEmail")}
        hint="Where we tell the shop that a customer accepted, paid or booked. Leave it empty to use the owners' addresses."
      />
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Sales tax rate (%)" inputMode="decimal" {...field("taxRate")} hint="Applied to taxable lines, e.g. 8.25." />
        <TextField label="Deposit (% of total)" inputMode="numeric" {...field("depositPct")} />
        <TextField label="Labour rate ($ per hour)" inputMode="decimal" {...field("labourRate")} />
        <TextField
          label="Fabrication rate ($ per hour)"
          inputMode="decimal"
          {...field("fabricationRate")}
          hint="Fender trimming and other cutting work."
        />
        <TextField label="Quote valid for (days)" inputMode="numeric" {...field("quoteValidityDays")} />
        <TextField label="Currency" readOnly {...field("currency")} hint="Quotes and deposits are in US dollars." />
      </div>
      <Button type="submit" pending={formState.isSubmitting} className="self-start">
        Save settings
      </Button>
    </form>
  );
}
