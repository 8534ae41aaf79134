import { createServer } from "node:http";
import { NextRequest } from "next/server";
import { ctx } from "./requests";

type Handler = (req: NextRequest, context: ReturnType<typeof ctx>) => Promise<Response>;

export interface Delivered {
  body: string;
  signature: string;
  status: number;
  answer: { outcome?: string; error?: string } & Record<string, unknown>;
}

/** The webhook route called as the provider calls it: the raw body and its signature header. */
export async function postWebhook(
  webhook: Handler,
  body: string,
  signature?: string,
): Promise<{ status: number; answer: Delivered["answer"] }> {
  const out = await webhook(
    new NextRequest("http://127.0.0.1:3000/api/payments/webhook", {
      method: "POST",
      body,
      headers: signature ? { "stripe-signature": signature } : {},
    }),
    ctx(),
  );
  return { status: out.status, answer: await out.json() };
}

/**
 * A local HTTP server the fake provider sends its webhooks to; each is passed into the route
 * handler and kept in `delivered` with its answer.
 */
export async function startWebhookForwarder(webhook: Handler) {
  const delivered: Delivered[] = [];
  const server = createServer((r, res) => {
    const chunks: Buffer[] = [];
    r.on("data", (c: Buffer) => chunks.push(c));
    r.on("end", async () => {
      const body = Buffer.concat(chunks).toString("utf8");
      const signature = String(r.headers["stripe-signature"] ?? "");
      const { status, answer } = await postWebhook(webhook, body, signature);
      delivered.push({ body, signature, status, answer });
      res.writeHead(status, { "Content-Type": "application/json" });
      res.end(JSON.stringify(answer));
    });
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", () => r()));
  return {
    delivered,
    url: `http://127.0.0.1:${(server.address() as { port: number }).port}/`,
    close: () => new Promise<void>((r) => server.close(() => r())),
  };
}
