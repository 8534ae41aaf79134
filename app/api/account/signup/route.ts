import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { hashPassword } from "@/lib/platform/auth/password";
import { route } from "@/lib/platform/http/route";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { userDto } from "@/lib/accounts/api";
import { userQueries } from "@/lib/accounts/queries";
import { signUpSchema } from "@/lib/accounts/schema";

/**
 * Creates the account (the form then signs in). An address already in use is said so: sign-up
 * signs in at once, so a neutral "check your e-mail" cannot be answered for a fresh address
 * either. What limits discovery is the per-address rate limit (RATE_LIMITS.signUp) and that the
 * password is hashed before the insert either way, so both answers take the same time. A taken
 * address is a DuplicateEmailError: a field error on `email` (422).
 */
export const POST = route({ access: "public", body: signUpSchema }, async ({ req, body }) => {
  await rateLimitQueries.consumeOrRefuse(
    [{ spec: RATE_LIMITS.signUp, key: clientAddress(req.headers) }],
    "Too many sign-ups from your network.",
  );
  const user = await userQueries.createUser({ email: body.email, name: body.name, passwordHash: await hashPassword(body.password) });
  return Response.json(userDto(user), { status: 201 });
});
