// @vitest-environment jsdom
import { act, cleanup, render, screen, within } from "@testing-library/react";
import type { ComponentType } from "react";
import { hydrateRoot } from "react-dom/client";
import { renderToString } from "react-dom/server";
import { afterEach, describe, expect, it } from "vitest";
import { clientLazy } from "./clientLazy";

afterEach(cleanup);

function Word({ word }: { word: string }) {
  return <p>The word is {word}</p>;
}
const placeholder = () => <p role="status">Loading the word</p>;

describe("clientLazy", () => {
  it("renders only the placeholder on the server, without fetching the code", () => {
    let fetched = 0;
    const Lazy = clientLazy(async () => {
      fetched += 1;
      return Word;
    }, placeholder);
    const html = renderToString(<Lazy word="hub" />);
    expect(html).toContain("Loading the word");
    expect(html).not.toContain("The word is");
    expect(fetched).toBe(0);
  });

  it("shows the placeholder while the code arrives, then the component with its props", async () => {
    let arrive: (c: ComponentType<{ word: string }>) => void = () => undefined;
    const Lazy = clientLazy(() => new Promise<ComponentType<{ word: string }>>((resolve) => (arrive = resolve)), placeholder);
    render(<Lazy word="hub" />);
    expect(screen.getByRole("status").textContent).toBe("Loading the word");
    arrive(Word);
    expect((await screen.findByText(/The word is/)).textContent).toBe("The word is hub");
    expect(screen.queryByRole("status")).toBeNull();
  });

  it("renders nothing while the code arrives when it has no placeholder", async () => {
    const Lazy = clientLazy(async () => Word);
    const { container } = render(<Lazy word="face" />);
    expect(container.textContent).toBe("");
    expect((await screen.findByText(/The word is/)).textContent).toBe("The word is face");
  });

  it("hydrates the server's placeholder without a mismatch, then loads the component", async () => {
    const Lazy = clientLazy(async () => Word, placeholder);
    const host = document.createElement("div");
    host.innerHTML = renderToString(<Lazy word="lug" />);
    document.body.append(host);
    const problems: unknown[] = [];
    await act(async () => {
      hydrateRoot(host, <Lazy word="lug" />, { onRecoverableError: (e) => problems.push(e) });
    });
    expect((await within(host).findByText(/The word is/)).textContent).toBe("The word is lug");
    expect(problems).toEqual([]);
    host.remove();
  });
});
