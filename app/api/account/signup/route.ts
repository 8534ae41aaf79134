import { hashPassword } from "@/lib/auth/password";
import { HttpError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { DuplicateEmailError, userQueries } from "@/lib/server/users";
import { signUpSchema } from "@/lib/validation/account";

export const POST = route({ access: "public", body: signUpSchema }, async ({ body }) => {
  try {
    const user = await userQueries.createUser({ email: body.email, name: body.name, passwordHash: await hashPassword(body.password) });
    return Response.json({ id: user.id, email: user.email, name: user.name }, { status: 201 });
  } catch (e) {
    if (e instanceof DuplicateEmailError) throw new HttpError(422, "Some fields need attention.", { email: [e.message] });
    throw e;
  }
});
