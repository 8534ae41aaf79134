import type { ComponentProps } from "react";
import { TextField } from "@/components/ui/TextField";

/**
 * A password input as the account forms use it: `choose` for a password being chosen (the
 * browser offers to make and keep one), otherwise the one already held (the browser fills it in).
 */
export function PasswordField({
  choose = false,
  label = "Password",
  ...rest
}: Omit<ComponentProps<typeof TextField>, "label" | "type" | "autoComplete"> & { choose?: boolean; label?: string }) {
  return <TextField label={label} type="password" autoComplete={choose ? "new-password" : "current-password"} {...rest} />;
}
