// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";

const caller = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("@/lib/platform/auth/session", () => ({ currentCaller: async () => caller.current }));
vi.mock("next/link", () => ({
  default: ({ href, children, ...rest }: { href: string; children: ReactNode }) => (
    <a href={href} {...rest}>
      {children}
    </a>
  ),
}));

const { default: HomePage } = await import("./page");

afterEach(() => {
  cleanup();
  caller.current = null;
});

describe("home page", () => {
  it("leads a visitor straight to the free tools and says they need no account", async () => {
    render(await HomePage());
    const hero = screen.getByRole("heading", { level: 1 }).closest("section")!;
    // The first call to action opens the workspace, not the sign-up form.
    const links = within(hero).getAllByRole("link");
    expect(links[0]).toHaveProperty("href", expect.stringMatching(/\/workspace$/));
    expect(hero.textContent).toMatch(/free/i);
    expect(hero.textContent).toMatch(/no account/i);
    // Each free tool is named and linked.
    for (const [name, href] of [
      [/workspace/i, "/workspace"],
      [/converter/i, "/convert"],
      [/ring helper/i, "/beadlock"],
    ] as const) {
      expect(
        screen.getAllByRole("link", { name }).some((a) => a.getAttribute("href") === href),
        String(name),
      ).toBe(true);
    }
  });

  it("says plainly what an account is for: saving, sharing, the garage", async () => {
    render(await HomePage());
    const account = screen.getByRole("region", { name: /what an account adds/i });
    for (const word of [/sav(e|ing)/i, /shar(e|ing)/i, /garage/i]) expect(account.textContent).toMatch(word);
    expect(
      within(account)
        .getByRole("link", { name: /create a free account/i })
        .getAttribute("href"),
    ).toBe("/sign-up");
  });

  it("points a signed-in member at their work instead of the sign-up form", async () => {
    caller.current = { userId: "u1", role: "member", shopId: null, name: "Odile", email: "o@example.test" };
    render(await HomePage());
    expect(screen.queryByRole("link", { name: /create a free account/i })).toBeNull();
    expect(screen.getAllByRole("link", { name: /my comparisons/i })[0]!.getAttribute("href")).toBe("/comparisons");
  });
});
