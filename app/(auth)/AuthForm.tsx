"use client";
import type { FormEventHandler, ReactNode } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";

/**
 * The frame the account forms share (sign-in, sign-up and its confirmation, password reset,
 * joining a shop): an optional notice, the failure in a live region that exists before it has
 * anything to say (so screen readers announce it at once), the fields, and the submit button
 * with its pending state.
 */
export function AuthForm({
  onSubmit,
  failure,
  recovery,
  pending,
  submit,
  notice,
  children,
}: {
  onSubmit: FormEventHandler<HTMLFormElement>;
  failure: string | null | undefined;
  /** What the person can do about a failure (links), said after it. */
  recovery?: ReactNode;
  pending: boolean;
  /** The submit button's words. */
  submit: string;
  notice?: string;
  children: ReactNode;
}) {
  return (
    <form onSubmit={onSubmit} noValidate className="mt-5 flex flex-col gap-3">
      {notice && <Alert tone="success">{notice}</Alert>}
      <div aria-live="assertive">
        {failure && (
          <Alert tone="error">
            {failure} {recovery}
          </Alert>
        )}
      </div>
      {children}
      <Button type="submit" pending={pending}>
        {submit}
      </Button>
    </form>
  );
}
