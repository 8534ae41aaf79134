// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { type UserItem, UsersTable } from "./UsersTable";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const person = (id: string, role: UserItem["role"], email: string): UserItem => ({
  id,
  email,
  name: email.split("@")[0]!,
  role,
  shopId: null,
  shopName: null,
  createdAt: "2026-12-01T00:00:00.000Z",
  updatedAt: "2026-12-01T00:00:00.000Z",
});
const ME = person("ad000000-0000-4000-8000-000000000001", "admin", "me@example.test");
const OTHER = person("ad000000-0000-4000-8000-000000000002", "member", "other@example.test");

function renderTable() {
  return render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: 60_000 } } })}>
      <UsersTable
        initial={[ME, OTHER]}
        shops={[{ id: "5a000000-0000-4000-8000-000000000001", name: "Invented Tire Barn" }]}
        selfId={ME.id}
      />
    </QueryClientProvider>,
  );
}

describe("admin users table", () => {
  it("says which control a refused change is about, as the column header names it", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(
        async () =>
          new Response(JSON.stringify({ error: "Some fields need attention.", fieldErrors: { shopId: ["That shop does not exist."] } }), {
            status: 422,
          }),
      ),
    );
    renderTable();
    fireEvent.change(screen.getByLabelText("Role of other@example.test"), { target: { value: "shop_staff" } });
    const row = screen.getByLabelText("Role of other@example.test").closest("tr")!;
    fireEvent.click(within(row).getByRole("button", { name: "Save other@example.test" }));
    expect(await within(row).findByText("Shop: that shop does not exist.")).toBeTruthy();
    expect(within(row).queryByText("Some fields need attention.")).toBeNull();
  });

  it("does not offer to change one's own role, and says who can", () => {
    renderTable();
    const mine = screen.getByLabelText("Role of me@example.test") as HTMLSelectElement;
    expect(mine.disabled).toBe(true);
    expect(mine.getAttribute("aria-describedby")).toBeTruthy();
    expect(document.getElementById(mine.getAttribute("aria-describedby")!)?.textContent).toBe("Another admin changes your own role.");
  });
});
