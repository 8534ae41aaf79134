import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { hashPassword } from "@/lib/platform/auth/password";
import { HttpError } from "@/lib/platform/http/errors";
import { route } from "@/lib/platform/http/route";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { DuplicateEmailError, userQueries } from "@/lib/accounts/queries";
import { signUpSchema } from "@/lib/accounts/schema";

/**
 * Creates the account (the form then signs in). An address already in use is said so: sign-up
 * signs in at once, so a neutral "check your e-mail" cannot be answered for a fresh address
 * either. What limits discovery is the per-address rate limit (RATE_LIMITS.signUp) and that the
 * password is hashed before the insert either way, so both answers take the same time.
 */
export const POST = route({ access: "public", body: signUpSchema }, async ({ req, body }) => {
  await rateLimitQueries.consumeOrRefuse([{ spec: RATE_LIMITS.signUp, key: clientAddress(req.headers) }], "Too many sign-ups from your network.");
  try {
    const user = await userQueries.createUser({ email: body.email, name: body.name, passwordHash: await hashPassword(body.password) });
    return Response.json({ id: user.id, email: user.email, name: user.name }, { status: 201 });
  } catch (e) {
    if (e instanceof DuplicateEmailError) throw new HttpError(422, "Some fields need attention.", { email: [e.message] });
    throw e;
  }
});
