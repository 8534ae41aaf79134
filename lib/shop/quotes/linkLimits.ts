import "server-only";
import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";

/**
 * Anyone with a quote's link may act on it: a cap per link and per address keeps scripts from
 * looping over actions that mail someone or open a provider session (429 with Retry-After).
 */
export function refuseTooManyLinkActions(req: Request, token: string): Promise<void> {
  return rateLimitQueries.consumeOrRefuse(
    [
      { spec: RATE_LIMITS.quoteActionsPerLink, key: token },
      { spec: RATE_LIMITS.quoteActionsPerAddress, key: clientAddress(req.headers) },
    ],
    "Too many actions on this quote.",
  );
}
