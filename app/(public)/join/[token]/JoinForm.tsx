"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { type JoinShopInput, joinShopSchema } from "@/lib/shop/schema";

export function JoinForm({ token, email, hasAccount }: { token: string; email: string; hasAccount: boolean }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<JoinShopInput>({
    resolver: zodResolver(joinShopSchema),
    defaultValues: { token },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await api("/api/join", { body: values });
    } catch (e) {
      setFailure(applyFieldErrors(e, setError, ["name", "password"]));
      return;
    }
    const res = await signIn("credentials", { email, password: values.password, redirect: false });
    router.push(res?.ok ? "/shop" : "/sign-in?callbackUrl=%2Fshop");
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="mt-5 flex flex-col gap-3">
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
      <input type="hidden" {...register("token")} />
      {!hasAccount && <TextField label="Your name" autoComplete="name" {...register("name")} error={formState.errors.name?.message} />}
      <TextField
        label="Password"
        type="password"
        autoComplete={hasAccount ? "current-password" : "new-password"}
        hint={hasAccount ? undefined : "At least 10 characters."}
        {...register("password")}
        error={formState.errors.password?.message}
      />
      <Button type="submit" pending={formState.isSubmitting}>
        Join the shop
      </Button>
    </form>
  );
}
