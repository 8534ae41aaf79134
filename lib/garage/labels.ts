/** Words for the garage's measured points, shared by forms, the vehicle page and the workspace (no zod here: the workspace bundle stays small). */
import type { ClearanceBasis, ClearanceStatus } from "@/lib/fitment";

export const CLEARANCE_DIRECTION_LABEL = {
  inboard: "Inboard (frame, control arm, spring)",
  outboard: "Outboard (fender lip, flare)",
  upward: "Upward (fender, liner)",
  "fore-aft": "Fore/aft at full lock (bumper, body mount)",
} as const;

export const SUSPENSION_STATE_LABEL = {
  "ride-height": "Ride height",
  "full-stuff": "Full stuff (compressed)",
  "full-lock": "Full lock",
} as const;

export const CLEARANCE_STATUS_LABEL: Record<ClearanceStatus, string> = { clear: "Clear", tight: "Tight", contact: "Contact" };

/** How a prediction was worked out, in a few words (lib/fitment/clearance.ts names the geometry). */
export const CLEARANCE_BASIS_LABEL: Record<ClearanceBasis, string> = {
  radius: "tread rises by the radius change",
  reach: "sidewall moves by the reach change",
  corner: "to the tread corner below the part",
  shoulder: "worst of beside the sidewall and over the shoulder",
  radial: "radius change along the radius",
  chord: "tread edge at the part's height",
  "sweep-inner": "inner tread corner swinging about the steering axis",
  "sweep-outer": "outer tread corner swinging about the steering axis",
  "sweep-farthest": "farthest tread corner swinging about the steering axis",
};
