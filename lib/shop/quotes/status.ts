import type { QuoteStatus } from "@/lib/platform/db/types";

/** How each quote status reads on screen, in the PDF and in error messages (server and browser). */
export const STATUS_LABEL: Record<QuoteStatus, string> = {
  draft: "Draft",
  sent: "Sent",
  accepted: "Accepted",
  deposit_paid: "Deposit paid",
  installed: "Installed",
  declined: "Declined",
  expired: "Expired",
};
