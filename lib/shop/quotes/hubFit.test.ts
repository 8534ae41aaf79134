import { describe, expect, it } from "vitest";
import { checkWheelOnHub, hubRefusal, ringLineDescription } from "./hubFit";

const truck = { boltPattern: "6x5.5", hubBoreMm: 108 };
const codes = (v: Parameters<typeof checkWheelOnHub>[0], w: Parameters<typeof checkWheelOnHub>[1]) =>
  checkWheelOnHub(v, w).map((f) => f.code);

describe("a wheel on the vehicle's hub", () => {
  it("reads 6x139.7 as the same drilling as 6x5.5 (5.5 in × 25.4 mm/in = 139.7 mm, NIST SP 811)", () => {
    expect(codes(truck, { boltPattern: "6x139.7", centerBoreMm: 108 })).toEqual(["bolt-pattern-matches", "hub-centric"]);
  });

  it("refuses another drilling: 8x6.5 on 6x5.5, and 6x135 (6x5.315 in) on 6x139.7", () => {
    const f = checkWheelOnHub(truck, { boltPattern: "8x6.5", centerBoreMm: 125 });
    expect(f[0]).toMatchObject({
      level: "refuse",
      code: "bolt-pattern-differs",
      message: "The wheel is drilled 8x6.5; the vehicle is 6x5.5: it does not bolt on.",
    });
    expect(codes(truck, { boltPattern: "6x135", centerBoreMm: 108 })[0]).toBe("bolt-pattern-differs");
  });

  it("refuses a 106.1 mm bore on a 108 mm hub: it cannot seat (common practice, no source)", () => {
    const f = checkWheelOnHub(truck, { boltPattern: "6x5.5", centerBoreMm: 106.1 });
    expect(f[1]).toMatchObject({ level: "refuse", code: "bore-too-small" });
    expect(hubRefusal(f)).toBe(
      "The wheel's 106.1 mm centre bore is smaller than the vehicle's 108 mm hub: it will not seat on this vehicle.",
    );
  });

  it("takes a larger bore and asks for hub-centric rings sized bore × hub (common practice, no source)", () => {
    const f = checkWheelOnHub({ boltPattern: "6x139.7", hubBoreMm: 106.1 }, { boltPattern: "6x5.5", centerBoreMm: 108 });
    expect(f[1]).toMatchObject({ level: "caution", code: "needs-rings", rings: { outerMm: 108, innerMm: 106.1 } });
    expect(f[1]!.message).toMatch(/hub-centric rings \(108 mm outside, 106\.1 mm inside\), one per wheel/);
    expect(hubRefusal(f)).toBeNull();
    expect(ringLineDescription(f[1]!.rings!)).toBe("Hub-centric rings 108 mm × 106.1 mm (one per wheel)");
  });

  it("counts bores within 0.05 mm of the hub as the hub's size (figures are listed to 0.1 mm)", () => {
    expect(codes(truck, { boltPattern: "6x5.5", centerBoreMm: 108.04 })[1]).toBe("hub-centric");
    expect(codes(truck, { boltPattern: "6x5.5", centerBoreMm: 107.96 })[1]).toBe("hub-centric");
    expect(codes(truck, { boltPattern: "6x5.5", centerBoreMm: 107.9 })[1]).toBe("bore-too-small");
    expect(codes(truck, { boltPattern: "6x5.5", centerBoreMm: 108.1 })[1]).toBe("needs-rings");
  });

  it("asks for a measurement when a diameter or the drilling is not known, never assuming", () => {
    expect(codes({ boltPattern: "6x5.5", hubBoreMm: null }, { boltPattern: "6x5.5", centerBoreMm: 108 })).toEqual([
      "bolt-pattern-matches",
      "hub-bore-unknown",
    ]);
    expect(codes(truck, { boltPattern: null, centerBoreMm: null })).toEqual(["bolt-pattern-unknown", "bore-unknown"]);
    expect(checkWheelOnHub(truck, { boltPattern: "six lug", centerBoreMm: 108 })[0]!.level).toBe("caution");
  });
});
