"use client";
import { TextField } from "@/components/ui/TextField";
import { AuthForm } from "@/app/(auth)/AuthForm";
import { PasswordField } from "@/app/(auth)/PasswordField";
import { useApiForm } from "@/app/(auth)/useApiForm";
import { useSignInThen } from "@/app/(auth)/useSignInThen";
import { type JoinShopInput, joinShopSchema } from "@/lib/shop/schema";

export function JoinForm({ token, email, hasAccount }: { token: string; email: string; hasAccount: boolean }) {
  const signInThen = useSignInThen();
  const { form, frame } = useApiForm<JoinShopInput>({
    schema: joinShopSchema,
    url: "/api/join",
    fields: ["name", "password"],
    defaultValues: { token },
    onDone: (_, values) => signInThen(email, values.password, "/shop", "/sign-in?callbackUrl=%2Fshop"),
  });
  const { register, formState } = form;
  return (
    <AuthForm {...frame} submit="Join the shop">
      <input type="hidden" {...register("token")} />
      {!hasAccount && <TextField label="Your name" autoComplete="name" {...register("name")} error={formState.errors.name?.message} />}
      <PasswordField
        choose={!hasAccount}
        hint={hasAccount ? undefined : "At least 10 characters."}
        {...register("password")}
        error={formState.errors.password?.message}
      />
    </AuthForm>
  );
}
