"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import type { QuoteStatus } from "@/lib/platform/db/types";

export function PublicQuoteActions({
  token,
  status,
  deposit,
  balance,
}: {
  token: string;
  status: QuoteStatus;
  deposit: string;
  balance: string;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  if (status !== "sent" && status !== "accepted") return null;
  const run = async (action: "accept" | "decline" | "pay") => {
    setFailure(null);
    setBusy(action);
    try {
      const r = await api<{ url?: string }>(`/api/q/${token}`, { body: { action } });
      if (action === "pay" && r.url) {
        // The provider's hosted page; it sends the customer back here when paid.
        window.location.assign(r.url);
        return;
      }
      router.refresh();
    } catch (e) {
      setFailure((e as Error).message);
    }
    setBusy(null);
  };
  return (
    <Card className="flex flex-col gap-3">
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
      {status === "sent" ? (
        <>
          <p>
            If the quote suits you, accept it; you then pay the deposit of {deposit} to book the work, and the balance of {balance} at the
            fitting.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button pending={busy === "accept"} onClick={() => void run("accept")}>
              Accept the quote
            </Button>
            <Button
              variant="secondary"
              pending={busy === "decline"}
              onClick={() => {
                if (window.confirm("Decline this quote?")) void run("decline");
              }}
            >
              Decline
            </Button>
          </div>
        </>
      ) : (
        <>
          <p>
            You accepted this quote. Pay the deposit of {deposit} to book the work; the balance of {balance} is due at the fitting.
          </p>
          <Button className="self-start" pending={busy === "pay"} onClick={() => void run("pay")}>
            Pay the {deposit} deposit
          </Button>
        </>
      )}
    </Card>
  );
}
