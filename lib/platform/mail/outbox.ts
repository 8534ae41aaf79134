import "server-only";
import { HttpError } from "@/lib/platform/http/errors";

/** A message as the local fake SMTP server keeps it (development and tests only). */
export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: { index: number; filename: string; contentType: string; size: number }[];
}

export function outboxUrl(): string | null {
  return process.env.OUTBOX_URL ?? null;
}

export async function fetchOutbox(): Promise<OutboxMessage[]> {
  const base = outboxUrl();
  if (!base) throw new HttpError(404, "The development outbox is not enabled on this server.");
  const res = await fetch(`${base}/messages`, { cache: "no-store" }).catch(() => null);
  if (!res?.ok) throw new HttpError(502, "The development mail server did not answer.");
  return (await res.json()) as OutboxMessage[];
}
