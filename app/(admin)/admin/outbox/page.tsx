import type { Metadata } from "next";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { type OutboxMessage, fetchOutbox, outboxUrl } from "@/lib/platform/mail/outbox";

export const metadata: Metadata = { title: "Development outbox" };
export const dynamic = "force-dynamic";

// Links in messages become clickable so a person trying the demo can follow them.
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <>
      {parts.map((p, i) =>
        /^https?:\/\//.test(p) ? (
          <a key={i} href={p} className="break-all text-ember-700 underline">
            {p}
          </a>
        ) : (
          <span key={i}>{p}</span>
        ),
      )}
    </>
  );
}

export default async function OutboxPage() {
  await requirePageCaller("/admin/outbox", ["admin"]);
  let messages: OutboxMessage[] | null = null;
  let problem: string | null = null;
  if (!outboxUrl()) problem = "The development outbox is not enabled on this server (OUTBOX_URL is not set).";
  else
    messages = await fetchOutbox().catch(() => {
      problem = "The local mail server did not answer.";
      return null;
    });
  return (
    <>
      <PageHeader
        title="Development outbox"
        lead="Every message the app sent through the local mail server, newest first. Real deployments send through their SMTP provider instead."
      />
      {problem && <Alert tone="warning">{problem}</Alert>}
      {messages && messages.length === 0 && <Alert>No messages yet.</Alert>}
      <div className="flex flex-col gap-4">
        {messages?.map((m) => (
          <Card key={m.id} data-testid="outbox-message">
            <div className="flex flex-wrap justify-between gap-2 text-sm text-basalt-500">
              <span>
                To <strong className="text-basalt-800">{m.to.join(", ")}</strong>
              </span>
              <time dateTime={m.receivedAt}>{new Date(m.receivedAt).toLocaleString("en-US", { timeZone: "UTC" })} UTC</time>
            </div>
            <h2 className="mt-1 text-lg font-semibold">{m.subject}</h2>
            <pre className="mt-3 whitespace-pre-wrap font-sans text-sm text-basalt-800">
              <Linkified text={m.text} />
            </pre>
            {m.attachments.length > 0 && (
              <ul className="mt-3 text-sm">
                {m.attachments.map((a) => (
                  <li key={a.index}>
                    📎 {a.filename} ({Math.round(a.size / 1024)} KB)
                  </li>
                ))}
              </ul>
            )}
          </Card>
        ))}
      </div>
    </>
  );
}
