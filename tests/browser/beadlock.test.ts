import { describe, expect, it } from "vitest";
import { filePage, seriousViolations, shot } from "./support/browser";

const session = filePage();

describe("beadlock ring helper: unit switch, tick-off and print sheet in Chromium", () => {
  it("converts the figure on a unit switch, ticks bolts from the keyboard, and prints on one page", async () => {
    const page = session.page();
    await page.goto("/beadlock", { waitUntil: "networkidle" });
    await page.getByLabel("Bolts on the ring").fill("24");
    await page.getByLabel("Maker's torque (ft·lb)").fill("18");
    const fullPass = page.getByTestId("torque-passes").locator("tbody tr").nth(2).locator("td");
    // 18 ft·lb × 1.355818 = 24.4 N·m (NIST SP 811 B.9).
    expect(await fullPass.nth(2).textContent()).toBe("24.4");
    await page.locator("label", { hasText: /^N·m$/ }).click();
    await expect.poll(() => page.getByLabel("Maker's torque (N·m)").inputValue()).toBe("24.4");
    expect(await fullPass.nth(1).textContent()).toBe("18.0");
    expect(await fullPass.nth(2).textContent()).toBe("24.4");

    // Tick-off from the keyboard: the button names the next bolt and keeps the focus (1, then 13 opposite).
    const tick = page.getByRole("region", { name: "Tick off as you go" });
    await tick.getByRole("button", { name: "Mark bolt 1 done" }).focus();
    await page.keyboard.press("Enter");
    await expect.poll(() => page.evaluate(() => document.activeElement?.textContent)).toBe("Mark bolt 13 done");
    expect(await page.getByTestId("tickoff-status").textContent()).toMatch(/next: bolt 13\b/);
    expect(await page.locator('[data-testid="ring-bolt"][data-next="true"]').getAttribute("data-bolt")).toBe("13");
    await shot(page, "beadlock-tickoff");
    expect(await seriousViolations(page)).toEqual([]);

    // The sheet: controls hidden, diagram, passes with the order boxes, and the cautions, on one page.
    await page.emulateMedia({ media: "print" });
    expect(await page.getByLabel("Maker's torque (N·m)").isVisible()).toBe(false);
    expect(await tick.isVisible()).toBe(false);
    expect(await page.getByTestId("ring-diagram").isVisible()).toBe(true);
    expect(await page.getByTestId("print-order").first().isVisible()).toBe(true);
    expect(await page.getByTestId("ring-cautions").isVisible()).toBe(true);
    expect(await page.getByTestId("print-summary").textContent()).toMatch(/24 bolts.*24\.4 N·m \(18 ft·lb\)/);
    await shot(page, "beadlock-print");
    for (const format of ["Letter", "A4"] as const) {
      const pdf = await page.pdf({ format, margin: { top: "12mm", bottom: "12mm", left: "12mm", right: "12mm" } });
      const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;
      expect(pages, `${format} pages`).toBe(1);
    }
    await page.close();
  });
});
