import { type FieldPath, type FieldValues, type UseFormReturn, get } from "react-hook-form";

/**
 * Binds a react-hook-form form to TextField/SelectField: `field(name)` is the field's registration
 * plus its error message, so a form names each field once instead of in `register` and again in `error`.
 * Nested names work (`weekdays.2.opens`); the message is the one zod gave that path.
 * @example const field = fieldBinder(form); <TextField label="Year" inputMode="numeric" {...field("year")} />
 */
export function fieldBinder<T extends FieldValues>({ register, formState }: Pick<UseFormReturn<T>, "register" | "formState">) {
  return <N extends FieldPath<T>>(name: N) => ({
    ...register(name),
    error: (get(formState.errors, name) as { message?: string } | undefined)?.message,
  });
}
