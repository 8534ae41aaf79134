/** Words for the garage's measured points, shared by forms, the vehicle page and the workspace (no zod here: the workspace bundle stays small). */
import type { ClearanceStatus } from "@/lib/fitment";

export const CLEARANCE_DIRECTION_LABEL = {
  inboard: "Inboard (frame, control arm, spring)",
  outboard: "Outboard (fender lip, flare)",
  upward: "Upward (fender, liner)",
  "fore-aft": "Fore/aft at full lock (bumper, body mount)",
} as const;

export const SUSPENSION_STATE_LABEL = { "ride-height": "Ride height", "full-stuff": "Full stuff (compressed)", "full-lock": "Full lock" } as const;

export const CLEARANCE_STATUS_LABEL: Record<ClearanceStatus, string> = { clear: "Clear", tight: "Tight", contact: "Contact" };
