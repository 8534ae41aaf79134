// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { signUpAnswer } from "@/lib/accounts/api";
import { SignUpForm } from "./SignUpForm";

const signIn = vi.hoisted(() => vi.fn());
vi.mock("next-auth/react", () => ({ signIn }));
vi.mock("next/navigation", () => ({ useRouter: () => ({ push: () => undefined, refresh: () => undefined }) }));
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  signIn.mockReset();
});

function server(status: number, body: unknown) {
  const calls: Record<string, unknown>[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (_url: string, init?: RequestInit) => {
      calls.push(JSON.parse(String(init?.body ?? "{}")));
      return new Response(JSON.stringify(body), { status });
    }),
  );
  return calls;
}

async function fillAndSend(email: string) {
  await userEvent.type(screen.getByLabelText("Name"), "Nia Brooke");
  await userEvent.type(screen.getByLabelText("E-mail"), email);
  await userEvent.type(screen.getByLabelText("Password"), "a long enough password");
  await userEvent.click(screen.getByRole("button", { name: "Create account" }));
}

describe("the sign-up form", () => {
  it("says 'check your e-mail' naming the address typed, in a live region, and signs nobody in", async () => {
    const calls = server(202, signUpAnswer("nia@example.test"));
    render(<SignUpForm />);
    await fillAndSend("nia@example.test");
    const status = await screen.findByRole("status");
    expect(status.textContent).toContain("Check your e-mail to finish signing up");
    expect(status.textContent).toContain("nia@example.test");
    expect(status.closest("[aria-live]")).not.toBeNull();
    expect(calls).toEqual([{ name: "Nia Brooke", email: "nia@example.test", password: "a long enough password" }]);
    expect(signIn).not.toHaveBeenCalled();
    expect(screen.queryByRole("button", { name: "Create account" })).toBeNull();

    // Another address: the form comes back with what was typed.
    await userEvent.click(screen.getByRole("button", { name: "Sign up with another address" }));
    expect((screen.getByLabelText("E-mail") as HTMLInputElement).value).toBe("nia@example.test");
  });

  it("puts the server's field errors beside the fields as the screen labels them", async () => {
    server(422, { error: "Some fields need attention.", fieldErrors: { email: ["That e-mail address is too long."] } });
    render(<SignUpForm />);
    await fillAndSend("nia@example.test");
    const email = screen.getByLabelText("E-mail");
    await waitFor(() => expect(email.getAttribute("aria-invalid")).toBe("true"));
    const describedBy = email.getAttribute("aria-describedby") ?? "";
    const messages = describedBy.split(" ").map((id) => document.getElementById(id)?.textContent);
    expect(messages).toContain("That e-mail address is too long.");
    expect(screen.queryByRole("status")).toBeNull();
  });
});
