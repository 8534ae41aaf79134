// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { StepPhoto } from "@/lib/shop/workOrders/api";
import { StepPhotos } from "./StepPhotos";

const sendPhoto = vi.hoisted(() => vi.fn());
const api = vi.hoisted(() => vi.fn());
vi.mock("@/lib/garage/photos/sendPhoto", () => ({ sendPhoto }));
vi.mock("@/lib/platform/client/api", () => ({ api }));

const WO = "0b000000-0000-4000-8000-000000000001";
const photo = (id: string, name: string): StepPhoto => ({
  id,
  position: "LF",
  step: "lug_torque",
  name,
  contentType: "image/jpeg",
  width: 1600,
  height: 1200,
  bytes: 300_000,
  takenBy: "Sam Staff",
  createdAt: "2026-12-03T15:00:00.000Z",
  url: `/api/shop/work-orders/${WO}/photos/${id}`,
  thumbUrl: `/api/shop/work-orders/${WO}/photos/${id}?variant=thumb`,
});
const A = photo("0c000000-0000-4000-8000-000000000001", "torque-pass-1.jpg");
const B = photo("0c000000-0000-4000-8000-000000000002", "torque-pass-2.jpg");

function setUp(props: Partial<Parameters<typeof StepPhotos>[0]> = {}) {
  const onAdded = vi.fn();
  const onRemoved = vi.fn();
  render(
    <StepPhotos
      workOrderId={WO}
      position="LF"
      step="lug_torque"
      photos={[A, B]}
      canAdd
      canRemove
      onAdded={onAdded}
      onRemoved={onRemoved}
      timeZone="America/Denver"
      {...props}
    />,
  );
  return { onAdded, onRemoved, user: userEvent.setup() };
}
const jpeg = (name: string, size = 2048) => new File([new Uint8Array(size)], name, { type: "image/jpeg" });

beforeEach(() => {
  sendPhoto.mockReset();
  api.mockReset();
});
afterEach(cleanup);

describe("a work order step's photos", () => {
  it("shows each photo as a thumbnail on the step and opens one full size, closed again by Escape", async () => {
    const { user } = setUp();
    const list = screen.getByRole("list", { name: "Photos of LF lug nuts torqued" });
    const thumbs = within(list).getAllByRole("img");
    expect(thumbs.map((t) => t.getAttribute("src"))).toEqual([A.thumbUrl, B.thumbUrl]);
    await user.click(screen.getByRole("button", { name: "Open photo torque-pass-2.jpg full size" }));
    const dialog = screen.getByRole("dialog", { name: "Photo of LF lug nuts torqued: torque-pass-2.jpg" });
    expect(within(dialog).getByTestId("photo-full").getAttribute("src")).toBe(B.url);
    // On the shop's clock, whatever the device's zone: 15:00 UTC is 8:00 AM in Denver in December (MST, UTC−7).
    expect(within(dialog).getByText(/taken by Sam Staff/).textContent).toContain("taken by Sam Staff, Thu, Dec 3, 2026, 8:00 AM MST");
    expect(document.activeElement).toBe(within(dialog).getByRole("button", { name: "Close" }));
    await user.keyboard("{Escape}");
    expect(screen.queryByRole("dialog")).toBeNull();
  });

  it("offers the camera and the phone's pictures, any image type (the server checks the bytes)", () => {
    setUp();
    const camera = screen.getByLabelText("Take a photo") as HTMLInputElement;
    const pick = screen.getByLabelText("Add photos") as HTMLInputElement;
    expect(camera.accept).toBe("image/*");
    expect(camera.getAttribute("capture")).toBe("environment");
    expect(camera.multiple).toBe(false);
    expect(pick.accept).toBe("image/*");
    expect(pick.multiple).toBe(true);
    expect(pick.getAttribute("capture")).toBeNull();
    expect(screen.getByText("JPEG, PNG or WebP, up to 10 MB. Location data is removed.")).toBeTruthy();
  });

  it("sends several photos one after another with the step, and refuses one over 10 MB with the garage's message without sending it", async () => {
    const { user, onAdded } = setUp();
    const added = photo("0c000000-0000-4000-8000-000000000003", "wheel.jpg");
    sendPhoto.mockResolvedValueOnce(added);
    await user.upload(screen.getByLabelText("Add photos"), [jpeg("wheel.jpg"), jpeg("huge.jpg", 10 * 1024 * 1024 + 1)]);
    expect(sendPhoto).toHaveBeenCalledTimes(1);
    expect(sendPhoto.mock.calls[0]![0]).toBe(`/api/shop/work-orders/${WO}/photos`);
    expect(sendPhoto.mock.calls[0]![2]).toEqual({ position: "LF", step: "lug_torque" });
    expect(onAdded).toHaveBeenCalledWith(added);
    expect(await screen.findByText("huge.jpg is larger than 10 MB. Resize it or pick a smaller one.")).toBeTruthy();
  });

  it("shows the server's refusal beside the step", async () => {
    const { user, onAdded } = setUp();
    sendPhoto.mockRejectedValueOnce(new Error("That file is not a JPEG, PNG or WebP image (checked from its contents, not its name)."));
    await user.upload(screen.getByLabelText("Take a photo"), jpeg("shot.heic"));
    expect(
      await screen.findByText("shot.heic: That file is not a JPEG, PNG or WebP image (checked from its contents, not its name)."),
    ).toBeTruthy();
    expect(onAdded).not.toHaveBeenCalled();
  });

  it("removes a photo through its own address when the caller may", async () => {
    const { user, onRemoved } = setUp();
    api.mockResolvedValueOnce({ ok: true });
    await user.click(screen.getByRole("button", { name: "Remove photo torque-pass-1.jpg" }));
    expect(api).toHaveBeenCalledWith(A.url, { method: "DELETE" });
    expect(onRemoved).toHaveBeenCalledWith(A.id);
  });

  it("offers no Remove when the caller may not (a signed step, staff), and nothing at all on a closed step without photos", () => {
    setUp({ canRemove: false, canAdd: false });
    expect(screen.getAllByRole("img")).toHaveLength(2);
    expect(screen.queryByRole("button", { name: /Remove photo/ })).toBeNull();
    expect(screen.queryByLabelText("Take a photo")).toBeNull();
    cleanup();
    const { container } = render(
      <StepPhotos
        workOrderId={WO}
        position="LF"
        step="lug_torque"
        photos={[]}
        canAdd={false}
        canRemove={false}
        onAdded={vi.fn()}
        onRemoved={vi.fn()}
        timeZone="America/Denver"
      />,
    );
    expect(container.innerHTML).toBe("");
  });
});
