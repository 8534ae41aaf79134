// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ConfirmSignUpForm } from "./ConfirmSignUpForm";

const signIn = vi.hoisted(() => vi.fn());
const push = vi.hoisted(() => vi.fn());
vi.mock("next-auth/react", () => ({ signIn }));
vi.mock("next/navigation", () => ({ useRouter: () => ({ push, refresh: () => undefined }) }));
afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
  signIn.mockReset();
  push.mockReset();
});

const TOKEN = "T".repeat(43);

/** The API answers `status` with `body`; `sent()` lists the bodies the form posted. */
function server(status: number, body: unknown) {
  const spy = vi.spyOn(globalThis, "fetch").mockImplementation(async () => new Response(JSON.stringify(body), { status }));
  return { sent: () => spy.mock.calls.map(([, init]) => JSON.parse(String(init?.body)) as Record<string, unknown>) };
}

async function confirmWith(password: string) {
  render(<ConfirmSignUpForm token={TOKEN} email="nia@example.test" />);
  await userEvent.type(screen.getByLabelText("Password"), password);
  await userEvent.click(screen.getByRole("button", { name: "Confirm and sign in" }));
}

describe("the sign-up confirmation form", () => {
  it("sends nothing until the button is pressed, then confirms and signs in with the same password", async () => {
    const api = server(201, { id: "u", email: "nia@example.test" });
    signIn.mockResolvedValue({ ok: true });
    render(<ConfirmSignUpForm token={TOKEN} email="nia@example.test" />);
    expect(api.sent()).toEqual([]);
    cleanup();
    await confirmWith("a long enough password");
    await waitFor(() => expect(push).toHaveBeenCalledWith("/account?welcome=1"));
    expect(api.sent()).toEqual([{ token: TOKEN, password: "a long enough password" }]);
    expect(signIn).toHaveBeenCalledWith("credentials", { email: "nia@example.test", password: "a long enough password", redirect: false });
  });

  it("sends to sign-in with its notice when signing in after the confirmation does not work", async () => {
    server(201, { id: "u", email: "nia@example.test" });
    signIn.mockResolvedValue({ ok: false, error: "Wait 1 minute before trying again." });
    await confirmWith("a long enough password");
    await waitFor(() => expect(push).toHaveBeenCalledWith("/sign-in?confirmed=1"));
  });

  it("says a used link in an alert, with a way to sign up again, and signs nobody in", async () => {
    const gone = "This sign-up link has expired, was already used or was replaced by a newer one.";
    server(422, { error: gone, fieldErrors: { token: [gone] } });
    await confirmWith("a long enough password");
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain(gone);
    expect(alert.closest("[aria-live]")).not.toBeNull();
    expect(screen.getByRole("link", { name: "Sign up again" }).getAttribute("href")).toBe("/sign-up");
    expect(signIn).not.toHaveBeenCalled();
  });

  it("puts a wrong password beside the Password field", async () => {
    server(422, {
      error: "Some fields need attention.",
      fieldErrors: { password: ["That is not the password you chose when signing up."] },
    });
    await confirmWith("not the one");
    const field = screen.getByLabelText("Password");
    await waitFor(() => expect(field.getAttribute("aria-invalid")).toBe("true"));
    expect(document.getElementById("f-password-error")?.textContent).toBe("That is not the password you chose when signing up.");
    expect(signIn).not.toHaveBeenCalled();
  });
});
