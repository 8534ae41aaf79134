"use client";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";

/**
 * After a form made or joined an account with a password: signs in with it (the credentials
 * provider, as the sign-in form does) and goes to `next`, or to `otherwise` (the sign-in page,
 * with its notice) when signing in did not work.
 */
export function useSignInThen() {
  const router = useRouter();
  return async (email: string, password: string, next: string, otherwise: string) => {
    const res = await signIn("credentials", { email, password, redirect: false });
    router.push(res?.ok ? next : otherwise);
    router.refresh();
  };
}
