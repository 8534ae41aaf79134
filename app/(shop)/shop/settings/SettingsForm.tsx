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
import { HEADER_FIELDS, SETTINGS_FIELD_NAMES, type SettingsField, TERMS_FIELDS } from "./settingsFields";

/** Draws each setting as a text field bound to the form (registration and error from fieldBinder). */
function fieldRows(fields: readonly SettingsField[], field: ReturnType<typeof fieldBinder<ShopSettingsInput>>) {
  return fields.map(({ name, ...shown }) => <TextField key={name} {...shown} {...field(name)} />);
}

export function SettingsForm({ initial }: { initial: Record<keyof ShopSettingsInput, string> }) {
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
      const rest = applyFieldErrors(e, setError, SETTINGS_FIELD_NAMES);
      if (rest) setMessage({ tone: "error", text: rest });
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <div aria-live="polite">{message && <Alert tone={message.tone}>{message.text}</Alert>}</div>
      {fieldRows(HEADER_FIELDS, field)}
      <div className="grid gap-3 sm:grid-cols-2">{fieldRows(TERMS_FIELDS, field)}</div>
      <Button type="submit" pending={formState.isSubmitting} className="self-start">
        Save settings
      </Button>
    </form>
  );
}
