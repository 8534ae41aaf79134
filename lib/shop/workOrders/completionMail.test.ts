import { describe, expect, it } from "vitest";
import { invoiceFigures } from "@/lib/shop/payments/invoice";
import { completionMail, workSummary } from "./completionMail";

const signed = (position: string, step: string, data: object) => ({
  position,
  step,
  data,
  signedBy: "Sam Staff",
  signedAt: "2027-03-16T17:00:00.000Z",
});
const order = {
  quoteNumber: 1003,
  vehicleDescription: "Test pickup",
  spare: false,
  beadlock: false,
  alignment: false,
  trimming: false,
  steps: [
    signed("LF", "fitted", { tire: "35x12.50R17", wheel: "17x9", dotCode: "2325", dotWeek: 23, dotYear: 2025 }),
    // 35 psi × 6.894757 kPa/psi = 241.3 kPa (NIST SP 811, appendix B.8)
    signed("LF", "pressure", { pressureKpa: 241.3165, unit: "psi" }),
    // 190 N·m ÷ 1.355818 N·m per ft·lb = 140.1 ft·lb (NIST SP 811, appendix B.8)
    signed("LF", "lug_torque", { torqueNm: 190, unit: "nm" }),
    signed("LF", "balance", { innerGrams: 40, outerGrams: 0 }),
  ],
} as const;

describe("workSummary", () => {
  it("lists per position what was fitted, the pressure set and the torque signed, with who signed; not the shop's inner steps", () => {
    const [lf, ...rest] = workSummary(order as never);
    expect(rest).toEqual([]);
    expect(lf).toEqual({
      heading: "Left front",
      lines: [
        "Tire and wheel as fitted: 35x12.50R17 on 17x9; DOT date code 2325 (week 23 of 2025) (signed by Sam Staff)",
        "Cold pressure set: Set cold to 35 psi (241 kPa) (signed by Sam Staff)",
        "Lug nuts torqued: Lug nuts to 190 N·m (140.1 ft·lb) in the star order, all passes (signed by Sam Staff)",
      ],
    });
  });
});

describe("completionMail", () => {
  const facts = {
    customer: { name: "Ada <Admin>", email: "ada@example.test" },
    shop: { name: "Shop A", address: "1 Test Lane", phone: "555-0100" },
    order: order as never,
    doneAt: new Date("2027-03-16T17:00:00Z"),
    recheckDueAt: new Date("2027-03-23T17:00:00Z"),
    timeZone: "America/Denver",
    invoice: invoiceFigures(430782, [{ kind: "deposit", status: "paid", amountCents: 107696 }], []),
    payUrl: "http://127.0.0.1:3000/q/abc",
  };

  it("carries total − deposit = balance due and the pay link (4,307.82 − 1,076.96 = 3,230.86, by hand)", () => {
    const m = completionMail(facts);
    expect(m.subject).toBe("Done: your wheels and tires at Shop A (quote Q-1003)");
    expect(m.text).toContain("Quote total: $4,307.82\nDeposit paid: −$1,076.96\nBalance due: $3,230.86\nStill to pay: $3,230.86");
    expect(m.text).toContain("Pay the balance of $3,230.86 here: http://127.0.0.1:3000/q/abc");
    expect(m.text).toContain("Please come back around Tue, Mar 23, 2027 to have the lug nuts re-checked");
    expect(m.html).toContain("Ada &#60;Admin&#62;");
    expect(m.html).not.toContain("<Admin>");
  });

  it("says Paid, with no pay link, when nothing is owed", () => {
    const paid = { ...facts, invoice: invoiceFigures(430782, [{ kind: "deposit", status: "paid", amountCents: 430782 }], []) };
    const m = completionMail(paid);
    expect(m.text).toContain("Status: Paid");
    expect(m.text).not.toContain("/q/abc");
  });
});
