"use client";
import { useState } from "react";
import { Button } from "@/components/ui/Button";

/** Ends every session of the account (a lost phone, a shared computer), then signs this browser out. */
export function SignOutEverywhereButton() {
  const [state, setState] = useState<"idle" | "pending" | "failed">("idle");
  const run = async () => {
    if (!window.confirm("Sign out on every device, this one included?")) return;
    setState("pending");
    try {
      const res = await fetch("/api/account/sessions/end-all", {
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: JSON.stringify({ confirm: true }),
      });
      if (!res.ok) throw new Error(String(res.status));
      const { signOut } = await import("next-auth/react");
      await signOut({ callbackUrl: "/sign-in?ended=1" });
    } catch {
      setState("failed");
    }
  };
  return (
    <div className="flex flex-col gap-2">
      <Button variant="secondary" pending={state === "pending"} onClick={run}>
        Sign out everywhere
      </Button>
      <p role="status" aria-live="polite" className="text-sm text-contact-800">
        {state === "failed" ? "That did not work; check the connection and try again." : ""}
      </p>
    </div>
  );
}
