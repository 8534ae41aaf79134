import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it, vi } from "vitest";
import { ctx, req } from "./support/requests";
import { VEHICLE, quoteRequest } from "./support/shopFixture";
import { staffAtCounter } from "./support/staffAtCounter";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
vi.mock("@/lib/platform/mail", () => ({ queueMail: async () => {}, appOrigin: () => "http://127.0.0.1:3000" }));

const db = staffAtCounter(session);

const customers = await import("@/app/api/shop/customers/route");
const quotes = await import("@/app/api/shop/quotes/route");
const pdfRoute = (await import("@/app/api/shop/quotes/[id]/pdf/route")).GET;

/** Where the PDF and its last page as an image are left for a person to look at. */
const OUT = join(process.cwd(), "test-results", "quote-drawing");

async function readPdf(buf: Buffer) {
  const { PDFParse } = await import("pdf-parse");
  const parser = new PDFParse({ data: new Uint8Array(buf) });
  try {
    const text = await parser.getText();
    const shot = await parser.getScreenshot({ partial: [text.total], scale: 1.5, imageBuffer: true, imageDataUrl: false });
    // Lines joined: the caption wraps where the page width says.
    const lastPage = (text.pages.at(-1)?.text ?? "").replace(/\s+/g, " ");
    return { text: text.text, pages: text.total, lastPage, png: shot.pages[0]?.data };
  } finally {
    await parser.destroy();
  }
}

describe("the quote PDF draws the current and the quoted setup at the hub", () => {
  it("ends with the cross-section: both setups' dimensions, legend and the key to the line styles", async () => {
    const cres = await customers.POST(
      req("POST", "/api/shop/customers", { name: "Ola Drawing", phone: "(555) 010-4455", email: "ola@example.test" }),
      ctx(),
    );
    const c = await cres.json();
    expect(cres.status, JSON.stringify(c)).toBe(201);
    const made = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId: c.customer.id, vehicle: VEHICLE })),
      ctx(),
    );
    expect(made.status).toBe(201);
    const { id } = await made.json();
    const warn = vi.spyOn(console, "warn");
    const res = await pdfRoute(req("GET", `/api/shop/quotes/${id}/pdf`), ctx({ id }));
    expect(res.status).toBe(200);
    const buf = Buffer.from(await res.arrayBuffer());
    // Everything of the drawing was understood by the PDF's SVG reader (it warns of what it skips).
    expect(warn.mock.calls.filter(([m]) => String(m).startsWith("quote drawing"))).toEqual([]);
    mkdirSync(OUT, { recursive: true });
    writeFileSync(join(OUT, "quote.pdf"), buf);
    const pdf = await readPdf(buf);
    if (pdf.png) writeFileSync(join(OUT, "drawing-page.png"), pdf.png);

    expect(pdf.lastPage).toContain("Side by side at the hub");
    expect(pdf.lastPage).toContain(
      "Current: solid lines, upright figures; planned (the quoted wheel and tire): dashed lines, italic figures.",
    );
    // The drawing's own words, set as text from its SVG: the legend names both tires, the
    // dimension lines say what they measure (the current wheel 17 x 8, +25 mm: offset 25 mm).
    expect(pdf.lastPage).toMatch(/Current 265\/70R17/);
    expect(pdf.lastPage).toMatch(/Planned /);
    expect(pdf.lastPage).toContain("offset +25 mm");
    expect(pdf.lastPage).toMatch(/backspacing \d+\.\d\d in/);
    expect(pdf.lastPage).toMatch(/diameter \d+\.\d\d in/);
    expect(pdf.lastPage).toContain("hub face");
    // Each label is set twice: its white halo first (the PDF has no paint order), then the figure.
    expect(pdf.lastPage.split("offset +25 mm").length - 1).toBe(2);
    expect(pdf.png?.length ?? 0).toBeGreaterThan(10_000);
  });
});
