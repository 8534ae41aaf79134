// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import { DEFAULT_PREFS } from "@/lib/comparisons/format";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { ForumPostButton } from "./ForumPostButton";
import { ShareOriginProvider } from "./ShareOrigin";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const result = computeComparison(DEFAULT_INPUT);
const SLUG = "AbCdEfGhIjKlMnOpQrStUvWx";

function show(origin = "https://hubface.example") {
  render(
    <ShareOriginProvider origin={origin}>
      <ForumPostButton result={result} prefs={DEFAULT_PREFS} name="Quarry [url=https://evil.example]road[/url]" path={`/s/${SLUG}`} />
    </ShareOriginProvider>,
  );
}

describe("Copy as forum post", () => {
  it("offers Markdown and BBCode, both with the drawing's image and the link on the public origin", async () => {
    const user = userEvent.setup();
    show("https://hubface.example/");
    await user.click(screen.getByRole("button", { name: "Show text" }));
    const md = (screen.getByTestId("forum-text") as HTMLTextAreaElement).value;
    expect(md).toContain(`(https://hubface.example/s/${SLUG}/opengraph-image)](https://hubface.example/s/${SLUG})`);
    expect(md.split("\n")[0]).toBe("**Quarry \\[url=https\\://evil\\.example\\]road\\[/url\\]**");

    await user.click(screen.getByRole("radio", { name: "BBCode" }));
    const bb = (screen.getByTestId("forum-text") as HTMLTextAreaElement).value;
    expect(screen.getByRole("textbox", { name: "Forum post text (BBCode)" })).toBe(screen.getByTestId("forum-text"));
    expect(bb).toContain(`[url=https://hubface.example/s/${SLUG}][img]https://hubface.example/s/${SLUG}/opengraph-image[/img][/url]`);
    expect(bb.split("\n")[0]).toBe("[b]Quarry ［url=https：//evil.example］road［/url］[/b]");
    expect(bb).toContain("[code]\n");
  });

  it("copies the chosen format and says which it copied", async () => {
    const user = userEvent.setup();
    const writeText = vi.fn(async () => {});
    Object.defineProperty(navigator, "clipboard", { value: { writeText }, configurable: true });
    show();
    await user.click(screen.getByRole("radio", { name: "BBCode" }));
    await user.click(screen.getByRole("button", { name: "Copy as forum post" }));
    expect(writeText).toHaveBeenCalledTimes(1);
    expect(String((writeText.mock.calls[0] as unknown[])[0])).toMatch(/^\[b\]Quarry /);
    expect(screen.getByTestId("forum-status").textContent).toMatch(/^Copied as BBCode: the figures, the drawing and the link\./);
  });
});
