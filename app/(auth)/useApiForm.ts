"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { type DefaultValues, type FieldValues, useForm } from "react-hook-form";
import type { z } from "zod";
import { api, applyFieldErrors } from "@/lib/platform/client/api";

/**
 * A form that posts its values to one API route: react-hook-form with the route's own zod
 * schema, the server's field errors put on the fields named in `fields`, anything else as the
 * form's failure message; `onDone` gets the answer and the values sent. `linkField` names a
 * value that has no input of its own (the token of the link the page was opened with): its
 * error is the form's failure. `frame` is what AuthForm takes.
 */
export function useApiForm<T extends FieldValues, R = unknown>(opts: {
  schema: z.ZodType<T, T>;
  url: string;
  fields: readonly (keyof T & string)[];
  linkField?: keyof T & string;
  defaultValues?: DefaultValues<T>;
  onDone: (answer: R, values: T) => void | Promise<void>;
}) {
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm<T>({ resolver: zodResolver(opts.schema), defaultValues: opts.defaultValues });
  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    let answer: R;
    try {
      answer = await api<R>(opts.url, { body: values });
    } catch (e) {
      setFailure(applyFieldErrors(e, form.setError, opts.fields));
      return;
    }
    await opts.onDone(answer, values);
  });
  const linkError = opts.linkField ? form.formState.errors[opts.linkField]?.message : undefined;
  const frame = { onSubmit, failure: failure ?? (typeof linkError === "string" ? linkError : null), pending: form.formState.isSubmitting };
  return { form, frame };
}
