import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { hashPassword } from "@/lib/platform/auth/password";
import { route } from "@/lib/platform/http/route";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { signUpAnswer } from "@/lib/accounts/api";
import { withinAccountMailLimits } from "@/lib/accounts/mailLimits";
import { signUpSchema } from "@/lib/accounts/schema";
import { signUpQueries } from "@/lib/accounts/signUpQueries";

/**
 * Starts a sign-up and answers "check your e-mail" (202) whether or not the address has an
 * account, so the form tells nobody who has one. A new address gets a confirmation link (the
 * account is made when it is used, app/api/account/signup/confirm); an address with an account
 * gets a notice and stays as it was. The password is hashed on both paths (the costly step), and
 * both then read the users table and queue one mail, so the answer takes about as long either
 * way. Over the per-address mail budget nothing is written or sent, and the answer is the same.
 */
export const POST = route({ access: "public", body: signUpSchema }, async ({ req, body }) => {
  await rateLimitQueries.consumeOrRefuse(
    [{ spec: RATE_LIMITS.signUp, key: clientAddress(req.headers) }],
    "Too many sign-ups from your network.",
  );
  const passwordHash = await hashPassword(body.password);
  if (await withinAccountMailLimits("signUp", body.email))
    await signUpQueries.startSignUp({ email: body.email, name: body.name, passwordHash });
  return Response.json(signUpAnswer(body.email), { status: 202 });
});
