/**
 * A local stand-in for the payment provider, implementing only what Hubface uses:
 *   POST /v1/checkout/sessions   create a checkout session (form-encoded, Bearer secret key), as the SDK sends it
 *   GET  /pay/:id                the hosted pay page with a test card form
 *   POST /pay/:id                pay: marks the session paid, sends a signed `checkout.session.completed`
 *                                event to the webhook URL, then sends the browser to the success URL
 *   POST /v1/checkout/sessions/:id/expire   expire an unpaid session (its page then takes no payment)
 *   POST /v1/refunds             refund part or all of a paid session's payment (`payment_intent`, `amount`);
 *                                answers the refund as pending, then sends a signed `refund.updated` event
 *                                with the refund's status "succeeded" — or "failed" (failure_reason
 *                                "expired_or_canceled_card") when the payment was made with the card whose
 *                                refunds fail; a failed refund gives nothing back, so it can be asked again
 * The webhook is signed the way the provider documents (header `Stripe-Signature: t=…,v1=…`,
 * v1 = HMAC-SHA256 of "t.payload" with the endpoint secret), so the SDK's constructEvent verifies it.
 *
 * Env: FAKE_PAY_PORT (2527), STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET, STRIPE_WEBHOOK_URL.
 * Test cards: 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined; 4000 0000 0000 5126 pays, but
 * every refund of it fails; anything failing the Luhn check is refused.
 */
import { createHmac, randomBytes } from "node:crypto";
import { type IncomingMessage, type Server, type ServerResponse, createServer } from "node:http";
import { pathToFileURL } from "node:url";

interface Session {
  id: string;
  object: "checkout.session";
  amount_total: number;
  amount_subtotal: number;
  currency: string;
  mode: string;
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  /** Set when paid: what a refund names. */
  payment_intent: string | null;
  /** Paid with the card whose refunds fail (not a field of the provider's session; never sent). */
  refundsFail?: boolean;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string;
  url: string;
  created: number;
  livemode: false;
  description: string;
}

interface Refund {
  id: string;
  object: "refund";
  amount: number;
  currency: string;
  payment_intent: string;
  metadata: Record<string, string>;
  status: "pending" | "succeeded" | "failed";
  failure_reason?: string;
  created: number;
}

export interface FakePayOptions {
  port: number;
  secretKey: string;
  webhookSecret: string;
  webhookUrl: string;
  host?: string;
}

/** Nested form fields as the SDK encodes them (`line_items[0][price_data][unit_amount]=…`). */
export function parseForm(body: string): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = key.replace(/\]/g, "").split("[");
    let node = out as Record<string, unknown>;
    path.forEach((p, i) => {
      if (i === path.length - 1) node[p] = value;
      else node = (node[p] ??= {}) as Record<string, unknown>;
    });
  }
  return out;
}

export function signPayload(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`).digest("hex");
  return `t=${timestamp},v1=${v1}`;
}

const luhn = (digits: string) => {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) d = d * 2 > 9 ? d * 2 - 9 : d * 2;
    sum += d;
  }
  return sum % 10 === 0;
};

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const usd = (cents: number) => `$${(cents / 100).toLocaleString("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;

function readBody(req: IncomingMessage, max = 64 * 1024): Promise<string> {
  return new Promise((resolve, reject) => {
    let size = 0;
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => {
      size += c.length;
      if (size > max) {
        reject(new Error("body too large"));
        req.destroy();
      } else chunks.push(c);
    });
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

function payPage(s: Session, error?: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>Pay ${esc(usd(s.amount_total))} — local test payments</title>
<style>
body{font-family:system-ui,sans-serif;background:#f4f5f6;color:#181b21;margin:0;padding:2rem 1rem}
main{max-width:26rem;margin:0 auto;background:#fff;border-radius:.75rem;padding:1.5rem;box-shadow:0 1px 3px #0002}
h1{font-size:1.3rem;margin:0 0 .25rem} p{margin:.25rem 0 1rem;color:#353c46}
label{display:block;font-weight:600;font-size:.9rem;margin-top:.75rem}
input{width:100%;box-sizing:border-box;font-size:1rem;padding:.55rem .7rem;border:1px solid #76818f;border-radius:.5rem;margin-top:.25rem}
.row{display:flex;gap:.75rem}.row>div{flex:1}
button{margin-top:1.25rem;width:100%;font-size:1rem;font-weight:700;padding:.75rem;border:0;border-radius:.5rem;background:#1f4a6f;color:#fff;cursor:pointer}
.err{background:#fde0dd;color:#7d1710;padding:.6rem .8rem;border-radius:.5rem}
.note{font-size:.85rem;color:#434c58;background:#eff6fb;padding:.6rem .8rem;border-radius:.5rem}
a{color:#1f4a6f}
</style></head>
<body><main>
<h1>Test payment</h1>
<p>${esc(s.description)}</p>
<p><strong style="font-size:1.5rem" data-testid="pay-amount">${esc(usd(s.amount_total))}</strong> ${esc(s.currency.toUpperCase())}</p>
<p class="note">Local test server — no real money moves. Card 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined; 4000 0000 0000 5126 pays, but its refunds fail.</p>
${error ? `<p class="err" role="alert">${esc(error)}</p>` : ""}
<form method="post" action="/pay/${esc(s.id)}">
<label for="card">Card number</label><input id="card" name="card" inputmode="numeric" autocomplete="cc-number" required>
<div class="row"><div><label for="exp">Expiry (MM/YY)</label><input id="exp" name="exp" autocomplete="cc-exp" required></div>
<div><label for="cvc">CVC</label><input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" required></div></div>
<label for="name">Name on card</label><input id="name" name="name" autocomplete="cc-name">
<button type="submit">Pay ${esc(usd(s.amount_total))}</button>
</form>
<p style="margin-top:1rem"><a href="${esc(s.cancel_url)}">Cancel and go back</a></p>
</main></body></html>`;
}

export function startFakePay(
  opts: FakePayOptions,
): Promise<{ server: Server; port: number; sessions: Map<string, Session>; close: () => Promise<void> }> {
  const sessions = new Map<string, Session>();
  const host = opts.host ?? "127.0.0.1";
  let base = "";

  const refunds = new Map<string, Refund>();
  const deliver = async (type: string, object: object): Promise<boolean> => {
    const event = {
      id: `evt_${randomBytes(12).toString("hex")}`,
      object: "event",
      api_version: "2025-01-01",
      created: Math.floor(Date.now() / 1000),
      type,
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      data: { object },
    };
    const payload = JSON.stringify(event);
    for (let attempt = 0; attempt < 4; attempt++) {
      try {
        const res = await fetch(opts.webhookUrl, {
          method: "POST",
          headers: { "Content-Type": "application/json", "Stripe-Signature": signPayload(payload, opts.webhookSecret) },
          body: payload,
        });
        if (res.ok) return true;
        if (res.status >= 400 && res.status < 500) {
          console.error(`fake-pay: webhook refused ${event.id}: ${res.status} ${await res.text()}`);
          return false;
        }
      } catch (e) {
        console.error(`fake-pay: webhook attempt ${attempt + 1} failed: ${(e as Error).message}`);
      }
      await new Promise((r) => setTimeout(r, 300 * 2 ** attempt));
    }
    return false;
  };

  const api = async (req: IncomingMessage, res: ServerResponse, parts: string[]) => {
    const json = (status: number, body: unknown) => {
      res.writeHead(status, { "Content-Type": "application/json" });
      res.end(JSON.stringify(body));
    };
    const fail = (status: number, message: string, param?: string) =>
      json(status, {
        error: { type: status === 401 ? "authentication_error" : "invalid_request_error", message, ...(param ? { param } : {}) },
      });
    if (req.headers.authorization !== `Bearer ${opts.secretKey}`) return fail(401, "Invalid API key provided.");
    if (req.method === "POST" && parts.join("/") === "v1/checkout/sessions") {
      const f = parseForm(await readBody(req)) as {
        mode?: string;
        success_url?: string;
        cancel_url?: string;
        client_reference_id?: string;
        customer_email?: string;
        metadata?: Record<string, string>;
        line_items?: Record<
          string,
          { quantity?: string; price_data?: { currency?: string; unit_amount?: string; product_data?: { name?: string } } }
        >;
      };
      if (f.mode !== "payment") return fail(400, "Only mode=payment is supported here.", "mode");
      if (!f.success_url || !f.cancel_url) return fail(400, "success_url and cancel_url are required.", "success_url");
      const items = Object.values(f.line_items ?? {});
      if (items.length === 0) return fail(400, "line_items is required.", "line_items");
      let amount = 0;
      let currency = "";
      for (const li of items) {
        const unit = Number(li.price_data?.unit_amount);
        const qty = Number(li.quantity ?? 1);
        if (!Number.isInteger(unit) || unit < 1 || !Number.isInteger(qty) || qty < 1)
          return fail(400, "unit_amount and quantity must be positive integers.", "line_items");
        currency = (li.price_data?.currency ?? "").toLowerCase();
        amount += unit * qty;
      }
      if (currency !== "usd") return fail(400, "Only usd is supported here.", "currency");
      const id = `cs_test_${randomBytes(16).toString("hex")}`;
      const s: Session = {
        id,
        object: "checkout.session",
        amount_total: amount,
        amount_subtotal: amount,
        currency,
        mode: "payment",
        status: "open",
        payment_status: "unpaid",
        payment_intent: null,
        client_reference_id: f.client_reference_id ?? null,
        customer_email: f.customer_email ?? null,
        metadata: f.metadata ?? {},
        success_url: f.success_url,
        cancel_url: f.cancel_url,
        url: `${base}/pay/${id}`,
        created: Math.floor(Date.now() / 1000),
        livemode: false,
        description: items.map((i) => i.price_data?.product_data?.name ?? "").join(", "),
      };
      sessions.set(id, s);
      return json(200, s);
    }
    if (req.method === "POST" && parts.length === 5 && parts[1] === "checkout" && parts[2] === "sessions" && parts[4] === "expire") {
      const s = sessions.get(parts[3]!);
      if (!s) return fail(404, `No such checkout.session: '${parts[3]}'`);
      if (s.status !== "open") return fail(400, `Only open checkout sessions can be expired; this one is ${s.status}.`);
      s.status = "expired";
      return json(200, s);
    }
    if (req.method === "POST" && parts.join("/") === "v1/refunds") {
      const f = parseForm(await readBody(req)) as { payment_intent?: string; amount?: string; metadata?: Record<string, string> };
      const paid = [...sessions.values()].find((x) => x.payment_intent && x.payment_intent === f.payment_intent);
      if (!paid) return fail(404, `No such payment_intent: '${f.payment_intent ?? ""}'`, "payment_intent");
      const refunded = [...refunds.values()]
        .filter((r) => r.payment_intent === paid.payment_intent && r.status !== "failed")
        .reduce((n, r) => n + r.amount, 0);
      const amount = f.amount === undefined ? paid.amount_total - refunded : Number(f.amount);
      if (!Number.isInteger(amount) || amount < 1) return fail(400, "amount must be a positive integer.", "amount");
      if (amount > paid.amount_total - refunded)
        return fail(
          400,
          `Refund amount (${amount}) is greater than unrefunded amount on the payment (${paid.amount_total - refunded}).`,
          "amount",
        );
      const refund: Refund = {
        id: `re_${randomBytes(12).toString("hex")}`,
        object: "refund",
        amount,
        currency: paid.currency,
        payment_intent: paid.payment_intent!,
        metadata: f.metadata ?? {},
        status: "pending",
        created: Math.floor(Date.now() / 1000),
      };
      refunds.set(refund.id, refund);
      // The provider settles a refund after answering; the webhook tells the app it succeeded (or failed).
      setTimeout(() => {
        if (paid.refundsFail) Object.assign(refund, { status: "failed", failure_reason: "expired_or_canceled_card" });
        else refund.status = "succeeded";
        void deliver("refund.updated", { ...refund });
      }, 20);
      return json(200, refund);
    }
    return fail(404, `Unrecognized request URL (${req.method} /${parts.join("/")}).`);
  };

  const server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://localhost");
    const parts = url.pathname.split("/").filter(Boolean);
    const html = (status: number, body: string) => {
      res.writeHead(status, { "Content-Type": "text/html; charset=utf-8", "Cache-Control": "no-store" });
      res.end(body);
    };
    (async () => {
      if (parts[0] === "v1") return api(req, res, parts);
      if (parts[0] === "pay" && parts[1]) {
        const s = sessions.get(parts[1]);
        if (!s) return html(404, "<!doctype html><html lang=en><title>Not found</title><p>No such checkout session.</p></html>");
        // No "start again" here: it may have been closed because the balance was paid another way. The shop's page says.
        if (s.status === "expired")
          return html(
            410,
            `<!doctype html><html lang=en><title>Closed</title><p>This checkout is closed and takes no payment.</p><p><a href="${esc(s.cancel_url)}">Back to the shop's page</a> to see what is still owed.</p></html>`,
          );
        if (req.method === "GET") {
          if (s.status === "complete") {
            res.writeHead(303, { Location: s.success_url });
            return res.end();
          }
          return html(200, payPage(s));
        }
        if (req.method === "POST") {
          const f = new URLSearchParams(await readBody(req));
          const card = (f.get("card") ?? "").replace(/[\s-]/g, "");
          if (!/^\d{12,19}$/.test(card) || !luhn(card)) return html(422, payPage(s, "That card number is not valid."));
          if (!/^(0[1-9]|1[0-2])\s*\/\s*\d{2}$/.test(f.get("exp") ?? "")) return html(422, payPage(s, "Enter the expiry as MM/YY."));
          if (!/^\d{3,4}$/.test(f.get("cvc") ?? "")) return html(422, payPage(s, "Enter the 3 or 4 digit CVC."));
          if (card === "4000000000000002") return html(402, payPage(s, "Your card was declined."));
          if (s.status !== "complete") {
            s.status = "complete";
            s.payment_status = "paid";
            s.payment_intent = `pi_${randomBytes(12).toString("hex")}`;
            s.refundsFail = card === "4000000000005126";
            const { refundsFail: _, ...sent } = s;
            await deliver("checkout.session.completed", sent);
          }
          res.writeHead(303, { Location: s.success_url });
          return res.end();
        }
      }
      res.writeHead(404, { "Content-Type": "application/json" });
      res.end(JSON.stringify({ error: "not found" }));
    })().catch((e: Error) => {
      console.error("fake-pay:", e);
      if (!res.headersSent) res.writeHead(500);
      res.end();
    });
  });

  return new Promise((resolve) => {
    server.listen(opts.port, host, () => {
      const addr = server.address();
      const port = typeof addr === "object" && addr ? addr.port : opts.port;
      base = `http://${host}:${port}`;
      resolve({ server, port, sessions, close: () => new Promise<void>((r) => server.close(() => r())) });
    });
  });
}

// Run as a script (scripts/start.sh and scripts/test.sh).
if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const need = (k: string) => {
    const v = process.env[k];
    if (!v) {
      console.error(`fake-pay: ${k} is not set`);
      process.exit(1);
    }
    return v;
  };
  const opts: FakePayOptions = {
    port: Number(process.env.FAKE_PAY_PORT ?? 2527),
    secretKey: need("STRIPE_SECRET_KEY"),
    webhookSecret: need("STRIPE_WEBHOOK_SECRET"),
    webhookUrl: need("STRIPE_WEBHOOK_URL"),
  };
  void startFakePay(opts).then(({ port, close }) => {
    console.log(`fake payment API on http://127.0.0.1:${port} (webhooks to ${opts.webhookUrl})`);
    const stop = () => void close().then(() => process.exit(0));
    process.on("SIGINT", stop);
    process.on("SIGTERM", stop);
  });
}
