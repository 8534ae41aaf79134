import type { ReactNode } from "react";
import { cx } from "./cx";

type Tone = "neutral" | "clear" | "tight" | "contact" | "ember" | "steel";
const tones: Record<Tone, string> = {
  neutral: "bg-basalt-100 text-basalt-700",
  clear: "bg-clear-100 text-clear-800",
  tight: "bg-tight-100 text-tight-800",
  contact: "bg-contact-100 text-contact-800",
  ember: "bg-ember-100 text-ember-800",
  steel: "bg-steel-100 text-steel-800",
};

export function Badge({ tone = "neutral", children }: { tone?: Tone; children: ReactNode }) {
  return <span className={cx("inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold", tones[tone])}>{children}</span>;
}
