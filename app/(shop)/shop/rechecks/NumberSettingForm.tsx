"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";

type Typed = Record<string, unknown>;
type Saved = Record<string, number>;

interface Props {
  /** The field's name, and the key of the route's body and answer. */
  name: string;
  value: number;
  label: string;
  hint: string;
  /** The route's own schema, so the form refuses what the route refuses, in the same words. */
  schema: z.ZodType<Saved, Typed>;
  /** PUT with `{ [name]: value }`, answering `{ [name]: saved }`. */
  url: string;
  /** What the success message says of the saved number. */
  saved: (value: number) => string;
  className?: string;
}

/** One whole-number setting of the owner's on the re-checks page (the days before the mail, the slot's length). */
export function NumberSettingForm({ name, value, label, hint, schema, url, saved, className }: Props) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Typed, unknown, Saved>({
    resolver: zodResolver(schema),
    defaultValues: { [name]: String(value) },
  });
  const save = handleSubmit(async (values) => {
    setMessage(null);
    try {
      const r = await api<Saved>(url, { method: "PUT", body: values });
      setMessage({ tone: "success", text: saved(r[name]!) });
      router.refresh();
    } catch (e) {
      const rest = applyFieldErrors(e, setError, [name]);
      if (rest) setMessage({ tone: "error", text: rest });
    }
  });
  const error = formState.errors[name]?.message;
  return (
    <Card className={className}>
      <form className="flex flex-wrap items-end gap-3" onSubmit={(e) => void save(e)} noValidate>
        <TextField
          className="w-48"
          label={label}
          inputMode="numeric"
          hint={hint}
          error={typeof error === "string" ? error : undefined}
          {...register(name)}
        />
        <Button type="submit" pending={formState.isSubmitting} className="mb-6">
          Save
        </Button>
      </form>
      <div aria-live="polite">{message && <Alert tone={message.tone}>{message.text}</Alert>}</div>
    </Card>
  );
}
