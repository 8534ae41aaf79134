"use client";
import Link from "next/link";
import { type ConfirmSignUpInput, confirmSignUpSchema } from "@/lib/accounts/schema";
import { AuthForm } from "../../AuthForm";
import { PasswordField } from "../../PasswordField";
import { useApiForm } from "../../useApiForm";
import { useSignInThen } from "../../useSignInThen";

/** After a link that cannot be used, or an address that got an account meanwhile. */
const startAgain = (
  <>
    <Link className="underline" href="/sign-up">
      Sign up again
    </Link>{" "}
    or{" "}
    <Link className="underline" href="/sign-in">
      sign in
    </Link>
    .
  </>
);

/**
 * Creates the account only when the button is pressed (a POST): opening the link must not use
 * it up, since mail scanners open links too. Asks for the password chosen at sign-up, which
 * both proves the person confirming chose it and signs them in with the credentials provider.
 */
export function ConfirmSignUpForm({ token, email }: { token: string; email: string }) {
  const signInThen = useSignInThen();
  const { form, frame } = useApiForm<ConfirmSignUpInput>({
    schema: confirmSignUpSchema,
    url: "/api/account/signup/confirm",
    fields: ["password"],
    linkField: "token",
    defaultValues: { token },
    onDone: (_, values) => signInThen(email, values.password, "/account?welcome=1", "/sign-in?confirmed=1"),
  });
  const { register, formState } = form;

  return (
    <AuthForm {...frame} submit="Confirm and sign in" recovery={startAgain}>
      <input type="hidden" {...register("token")} />
      <PasswordField hint="The one you chose when signing up." {...register("password")} error={formState.errors.password?.message} />
    </AuthForm>
  );
}
