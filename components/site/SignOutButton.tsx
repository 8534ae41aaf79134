"use client";
import { useState } from "react";
import { Button } from "@/components/ui/Button";

export function SignOutButton() {
  const [pending, setPending] = useState(false);
  return (
    <Button
      variant="secondary"
      className="min-h-9 py-1.5"
      pending={pending}
      onClick={() => {
        setPending(true);
        // Loaded on click: the header is on every page, and most visitors never sign out.
        void import("next-auth/react").then(({ signOut }) => signOut({ callbackUrl: "/" }));
      }}
    >
      Sign out
    </Button>
  );
}
