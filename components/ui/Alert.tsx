import type { ReactNode } from "react";
import { cx } from "./cx";

type Tone = "info" | "success" | "warning" | "error";
const tones: Record<Tone, string> = {
  info: "bg-steel-50 text-steel-800 ring-steel-200",
  success: "bg-clear-100 text-clear-800 ring-clear-600/30",
  warning: "bg-tight-100 text-tight-800 ring-tight-600/30",
  error: "bg-contact-100 text-contact-800 ring-contact-600/30",
};

/** A status message; errors are announced immediately, others politely. */
export function Alert({
  tone = "info",
  title,
  children,
  className,
}: {
  tone?: Tone;
  title?: string;
  children?: ReactNode;
  className?: string;
}) {
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={cx("rounded-lg px-4 py-3 text-sm ring-1 ring-inset", tones[tone], className)}
    >
      {title && <p className="font-semibold">{title}</p>}
      {children}
    </div>
  );
}
