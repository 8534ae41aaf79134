import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { route } from "@/lib/platform/http/route";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { userDto } from "@/lib/accounts/api";
import { confirmSignUpSchema } from "@/lib/accounts/schema";
import { signUpQueries } from "@/lib/accounts/signUpQueries";

/**
 * Uses a sign-up confirmation link: creates the account once (201, the form then signs in with
 * the same password). Only a POST does this; opening the link (a GET, which mail scanners also
 * do) shows the page and uses nothing up. Errors: lib/accounts/signUpQueries.ts confirmSignUp.
 */
export const POST = route({ access: "public", body: confirmSignUpSchema }, async ({ req, body }) => {
  await rateLimitQueries.consumeOrRefuse(
    [{ spec: RATE_LIMITS.signUpConfirm, key: clientAddress(req.headers) }],
    "Too many confirmations from your network.",
  );
  const user = await signUpQueries.confirmSignUp(body.token, body.password);
  return Response.json(userDto(user), { status: 201 });
});
