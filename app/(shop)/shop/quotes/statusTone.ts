import type { QuoteStatus } from "@/lib/platform/db/types";

export function statusTone(s: QuoteStatus | string): "neutral" | "steel" | "ember" | "clear" | "contact" | "tight" {
  switch (s) {
    case "sent":
      return "steel";
    case "accepted":
      return "ember";
    case "deposit_paid":
    case "installed":
      return "clear";
    case "declined":
      return "contact";
    case "expired":
      return "tight";
    default:
      return "neutral";
  }
}
