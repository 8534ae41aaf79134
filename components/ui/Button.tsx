import type { ButtonHTMLAttributes } from "react";
import { cx } from "./cx";

type Variant = "primary" | "secondary" | "ghost" | "danger";

const variants: Record<Variant, string> = {
  primary: "bg-ember-600 text-white hover:bg-ember-700 disabled:bg-ember-300",
  secondary: "bg-white text-basalt-900 ring-1 ring-inset ring-basalt-300 hover:bg-basalt-50 disabled:text-basalt-500",
  ghost: "text-basalt-700 hover:bg-basalt-100",
  danger: "bg-contact-600 text-white hover:bg-contact-800",
};

export const buttonClass = (variant: Variant = "primary", extra?: string) =>
  cx(
    "inline-flex min-h-10 items-center justify-center gap-2 rounded-lg px-4 py-2 text-sm font-semibold transition-colors disabled:cursor-not-allowed",
    variants[variant],
    extra,
  );

export function Button({
  variant = "primary",
  pending = false,
  className,
  children,
  disabled,
  ...rest
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; pending?: boolean }) {
  return (
    <button className={buttonClass(variant, className)} disabled={disabled || pending} aria-busy={pending || undefined} {...rest}>
      {pending && <span aria-hidden className="size-3.5 animate-spin rounded-full border-2 border-current border-t-transparent" />}
      {children}
    </button>
  );
}
