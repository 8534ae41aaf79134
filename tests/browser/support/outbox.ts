/** Reads the fake SMTP server's messages (OUTBOX_URL, set by scripts/test.sh). */
export interface Mail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { index: number; filename: string; contentType: string; size: number }[];
}

const OUTBOX = process.env.OUTBOX_URL ?? "http://127.0.0.1:2526";

export async function messagesTo(address: string): Promise<Mail[]> {
  const res = await fetch(`${OUTBOX}/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as Mail[];
}

/** Waits for the newest message to an address matching the subject. */
export async function waitForMail(address: string, subject: RegExp, timeoutMs = 15000): Promise<Mail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const found = (await messagesTo(address)).find((m) => subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no message to ${address} matching ${subject}`);
}

export async function attachment(id: string, index: number): Promise<Buffer> {
  const res = await fetch(`${OUTBOX}/messages/${id}/attachments/${index}`);
  return Buffer.from(await res.arrayBuffer());
}
