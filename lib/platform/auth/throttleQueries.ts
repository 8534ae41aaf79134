import "server-only";
import { bindAppDb } from "@/lib/platform/db/bind";
import { clearAttempts } from "./throttle";

/** The throttle's writes for route handlers, on the app's handle (handlers never hold it). */
export const throttleQueries = bindAppDb({ clearAttempts });
