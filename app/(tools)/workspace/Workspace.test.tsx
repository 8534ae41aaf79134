// @vitest-environment jsdom
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { PREFS_STORAGE_KEY } from "@/lib/comparisons/format";
import { decodeComparison } from "@/lib/comparisons/urlRead";
import { loadReading } from "./useReading";
import { Workspace } from "./Workspace";
import { freshWorkspaceEachTest, headline, renderDefault } from "./workspaceTestUtil";

// The charts load lazily through clientLazy; they are not what these tests are about.
// Typing through user-event in jsdom is slow on a shared machine; the default 5 s is too tight.
vi.setConfig({ testTimeout: 20_000 });
vi.mock("@/components/comparison/LazyComparisonCharts", () => ({ LazyComparisonCharts: () => <div data-testid="charts-stub" /> }));

const planned = () => within(screen.getByRole("region", { name: "Planned setup" }));

// These tests are about reading entries, not about its code arriving (Workspace.reading.test.tsx is):
// fetched once before them, as a page has it moments after load, the first test no longer races it.
beforeAll(() => loadReading());
freshWorkspaceEachTest();

describe("workspace inputs", () => {
  it("takes backspacing with fractions and shows the offset it stands for (W/2 + offset, common practice, no source)", async () => {
    const user = renderDefault();
    await user.click(planned().getByRole("radio", { name: "Backspacing" }));
    const bs = planned().getByLabelText("Backspacing (in)");
    // Switching keeps the same wheel: 9 in wide, −12 mm → 4.5 − 0.472 + 0.5 = 4.53 in to the flange edge.
    expect(bs).toHaveProperty("value", "4.5276");
    await user.clear(bs);
    await user.type(bs, "4-5/8");
    // 4-5/8 in to the flange, minus 1/2 in allowance = 4.125 in to the bead seat; offset (4.125 − 4.5) × 25.4 = −9.525 mm.
    expect(planned().getByText(/Offset −9\.5 mm/)).toBeTruthy();
    expect(window.location.search).toContain("pb=4.625&pr=flange");
    expect(planned().getByRole("radio", { name: "Flange edge" })).toHaveProperty("checked", true);
  });

  it("changes the offset when the reference switches from the flange edge to the bead seat", async () => {
    const user = userEvent.setup();
    render(
      <Workspace
        initialInput={{
          ...DEFAULT_INPUT,
          planned: {
            ...DEFAULT_INPUT.planned,
            position: { mode: "backspacing", backspacingIn: 4.625, reference: "flange", flangeIn: 0.5 },
          },
        }}
        initialProblems={[]}
      />,
    );
    expect(planned().getByText(/Offset −9\.5 mm/)).toBeTruthy();
    const before = window.history.length;
    await user.click(planned().getByRole("radio", { name: "Bead seat" }));
    // The same 4-5/8 in now reaches the bead seat: offset (4.625 − 4.5) × 25.4 = +3.175 mm.
    expect(planned().getByText(/Offset \+3\.2 mm/)).toBeTruthy();
    expect(window.location.search).toContain("pr=bead");
    // A discrete choice is its own history entry.
    expect(window.history.length).toBe(before + 1);
  });

  it("applies one unit toggle everywhere and remembers it", async () => {
    const user = renderDefault();
    // 939.8 − 802.8 = 137 mm = 5.39 in (1 in = 25.4 mm exactly).
    expect(headline("change-diameter")).toBe("+5.39 in");
    await user.click(screen.getByRole("radio", { name: "Metric" }));
    expect(headline("change-diameter")).toBe("+137 mm");
    // Metric readers get a round 100 km/h indicated: 100 × 939.8 / 802.8 = 117.07 km/h actual.
    expect(headline("change-speed")).toBe("117.1 km/h");
    expect(screen.getByLabelText(/Cruise speeds \(km\/h\)/)).toHaveProperty("value", "97, 113");
    expect(JSON.parse(window.localStorage.getItem(PREFS_STORAGE_KEY) ?? "{}")).toEqual({ units: "metric", lengths: "decimal" });
    await user.click(screen.getByRole("radio", { name: "Inch" }));
    await user.click(screen.getByRole("radio", { name: "Fractions" }));
    // 5.394 in → nearest sixteenth 86/16 = 5-3/8 in.
    expect(headline("change-diameter")).toBe("+5-3/8 in");
    // Switching back and forth did not round the cruise speeds.
    expect(screen.getByLabelText(/Cruise speeds \(mph\)/)).toHaveProperty("value", "60, 70");
  });

  it("shows an inline message with an accepted example and keeps the last complete results", async () => {
    const user = renderDefault();
    const tire = planned().getByLabelText("Tire size");
    await user.clear(tire);
    await user.type(tire, "37x12");
    expect(tire.getAttribute("aria-invalid")).toBe("true");
    const describedBy = (tire.getAttribute("aria-describedby") ?? "").split(" ");
    const message = describedBy.map((id) => document.getElementById(id)?.textContent ?? "").join(" ");
    expect(message).toMatch(/accepted forms: 265\/70R17/);
    expect(screen.getByTestId("results-status").textContent).toMatch(/last complete comparison: one field needs attention/);
    expect(headline("change-diameter")).toBe("+5.39 in");
    await user.type(tire, ".50R15LT");
    // The wheel diameter followed the tire to 15 in.
    expect(planned().getByLabelText("Wheel diameter (in)")).toHaveProperty("value", "15");
    expect(tire.getAttribute("aria-invalid")).toBeNull();
    expect(planned().getByText(/Reads as 37x12\.50R15LT/)).toBeTruthy();
  });

  it("draws where a backspacing is measured once the wheel position is given as backspacing, for the reference chosen", async () => {
    const user = renderDefault();
    expect(screen.queryByRole("img", { name: /^Backspacing measured/ })).toBeNull();
    await user.click(planned().getByRole("radio", { name: "Backspacing" }));
    expect(
      await planned().findByRole("img", {
        name: "Backspacing measured from the mounting face to the flange edge, which includes the flange allowance",
      }),
    ).toBeTruthy();
    await user.click(planned().getByRole("radio", { name: "Bead seat" }));
    expect(planned().getByRole("img", { name: "Backspacing measured from the mounting face to the bead seat" })).toBeTruthy();
  });

  it("names a wheel diameter that does not fit the tire", async () => {
    const user = renderDefault();
    const d = planned().getByLabelText("Wheel diameter (in)");
    await user.clear(d);
    await user.type(d, "18");
    expect(planned().getByText("Wheel diameter (in): a 17 in tire needs a 17 in wheel; this wheel is 18 in.")).toBeTruthy();
  });
});

describe("a link with values that cannot be used", () => {
  it("says which values were replaced, as the fields are labelled, and with what", () => {
    const { input, problems } = decodeComparison("po=190&pw=8&cruise=60,x,70&axle=12");
    render(<Workspace initialInput={input} initialProblems={problems} />);
    const items = within(screen.getByTestId("link-problems"))
      .getAllByRole("listitem")
      .map((li) => li.textContent);
    expect(items).toEqual([
      "Planned setup · Offset (mm): “190” puts the mounting face outside a 8 in wide wheel; using an offset of \u221212 mm.",
      "Axle ratio: “12” is outside 1–10; using 3.73.",
      "Cruise speeds: “60,x,70” has entries left out (“x” is not a number); using 60, 70 mph.",
    ]);
    expect(planned().getByLabelText("Offset (mm)")).toHaveProperty("value", "-12");
  });
});

describe("vehicle details panel", () => {
  const panel = () => screen.getByText(/^Vehicle details/).closest("details") as HTMLDetailsElement;
  const openPanel = async (user: ReturnType<typeof userEvent.setup>) => {
    await user.click(screen.getByText(/^Vehicle details/));
    expect(panel().open).toBe(true);
  };
  const renderWithPanelOpen = async () => {
    const user = renderDefault();
    await openPanel(user);
    return user;
  };
  /** Select all, delete, then type one key at a time, checking after each key. */
  const retype = async (user: ReturnType<typeof userEvent.setup>, field: HTMLElement, text: string) => {
    await user.click(field);
    await user.keyboard("{Control>}a{/Control}{Backspace}");
    for (const ch of text) {
      await user.keyboard(ch);
      expect(panel().open, `panel open after typing "${ch}" of "${text}"`).toBe(true);
      expect(document.activeElement, `focus kept after "${ch}" of "${text}"`).toBe(field);
    }
    expect(field).toHaveProperty("value", text);
  };

  it("stays open and keeps the focus while the axle ratio is retyped as 4.10", async () => {
    const user = await renderWithPanelOpen();
    await retype(user, screen.getByLabelText(/^Axle ratio/), "4.10");
    // 265/70R17 = 802.8 mm, 37 in = 939.8 mm (ISO 4000-1; 1 in = 25.4 mm, NIST SP 811): restoring ratio
    // 4.10 × 939.8 / 802.8 = 4.80, nearest common ratio 4.88 (with 4.00 it would be 4.68 → 4.56).
    expect(headline("change-ratio")).toBe("4.88");
    expect(window.location.search).toContain("axle=4.1");
  });

  it("stays open while cruise speeds, top gear and fender line are retyped", async () => {
    const user = await renderWithPanelOpen();
    await retype(user, screen.getByLabelText(/^Cruise speeds/), "55, 65");
    expect(window.location.search).toContain("cruise=55,65");
    await retype(user, screen.getByLabelText(/^Top-gear ratio/), "0.70");
    expect(window.location.search).toContain("top=0.7");
    await retype(user, screen.getByLabelText(/^Fender line/), "5-1/2");
    // 5.5 in × 25.4 = 139.7 mm (NIST SP 811).
    expect(window.location.search).toContain("fender=139.7");
  });

  it("takes first gear and transfer-case low and shows the crawl ratio beside the regear figures", async () => {
    const user = await renderWithPanelOpen();
    expect(screen.queryByTestId("change-crawl")).toBeNull();
    await retype(user, screen.getByLabelText(/^First-gear ratio/), "4.03");
    await retype(user, screen.getByLabelText(/^Transfer-case low ratio/), "2.72");
    // Crawl = first × low × axle (common 4x4 handbook definition, common practice, no written source):
    // 4.03 × 2.72 × 3.73 = 40.89:1; on the suggested 4.30, 47.13:1.
    expect(headline("change-crawl")).toBe("40.89:1");
    expect(headline("change-crawl-regeared")).toBe("47.13:1");
    expect(window.location.search).toContain("first=4.03&low=2.72");
  });

  it("converts each unit-bearing field on a unit switch even while another field has an error", async () => {
    const user = await renderWithPanelOpen();
    await retype(user, screen.getByLabelText(/^Fender line/), "5-1/2");
    await retype(user, screen.getByLabelText(/^Cruise speeds/), "55, 65");
    await retype(user, screen.getByLabelText(/^Axle ratio/), "abc");
    await user.click(screen.getByRole("radio", { name: "Metric" }));
    // 5.5 in × 25.4 = 139.7 mm, shown to the mm; 55 and 65 mph × 1.609344 = 88.5 and 104.6 km/h, shown 89, 105 (NIST SP 811).
    expect(screen.getByLabelText(/^Fender line from hub face \(mm\)/)).toHaveProperty("value", "140");
    expect(screen.getByLabelText(/^Cruise speeds \(km\/h\)/)).toHaveProperty("value", "89, 105");
    // The axle ratio keeps its text and its message.
    const axle = screen.getByLabelText(/^Axle ratio/);
    expect(axle).toHaveProperty("value", "abc");
    expect(axle.getAttribute("aria-invalid")).toBe("true");
    // Fixing it gives the converted figures, not 5.5 mm and 55 km/h; the stored speeds are still exactly 55 and 65 mph.
    await retype(user, axle, "3.73");
    expect(window.location.search).toContain("fender=139.7");
    expect(window.location.search).toContain("cruise=55,65");
  });

  it("keeps an unreadable unit-bearing text on a unit switch and says the unit changed under it", async () => {
    const user = await renderWithPanelOpen();
    await retype(user, screen.getByLabelText(/^Fender line/), "far");
    await user.click(screen.getByRole("radio", { name: "Metric" }));
    const fender = screen.getByLabelText(/^Fender line from hub face \(mm\)/);
    expect(fender).toHaveProperty("value", "far");
    const message = (fender.getAttribute("aria-describedby") ?? "")
      .split(" ")
      .map((id) => document.getElementById(id)?.textContent ?? "")
      .join(" ");
    expect(message).toMatch(/Fender line from hub face \(mm\): not a length in mm.*The unit is now mm; this text was not converted\./);
  });

  it("opens by itself when a vehicle figure has an error, stays open once it is fixed, and closes when the person closes it", async () => {
    const user = renderDefault();
    expect(panel().open).toBe(false);
    const axle = screen.getByLabelText(/^Axle ratio/);
    await user.clear(axle);
    expect(panel().open).toBe(true);
    await user.type(axle, "3.73");
    expect(axle.getAttribute("aria-invalid")).toBeNull();
    expect(panel().open).toBe(true);
    await user.click(screen.getByText(/^Vehicle details/));
    expect(panel().open).toBe(false);
  });
});
