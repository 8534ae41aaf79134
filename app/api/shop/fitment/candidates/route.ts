import { type FitmentCandidates, stockItemDto } from "@/lib/shop/catalog/api";
import { route } from "@/lib/platform/http/route";
import { rankPicks } from "@/lib/shop/quotes/fitment";
import { catalogQueries } from "@/lib/shop/catalog/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { counterVehicleForEngine, counterVehicleSchema } from "@/lib/shop/customers/schema";

/** The catalog's tire × wheel pairs that mount on this vehicle (drilling and hub bore), ranked by the engine's comparison. */
export const POST = route({ access: SHOP_ANY, body: counterVehicleSchema }, async ({ caller, body }): Promise<FitmentCandidates> => {
  const shopId = shopIdOf(caller);
  const v = counterVehicleForEngine(body);
  const { wheels, tires } = await catalogQueries.fitmentStock(shopId);
  const ranked = rankPicks(
    { boltPattern: v.boltPattern, tireSize: v.tireSize, wheel: v.wheel, axleRatio: v.axleRatio, hubBoreMm: v.hubBoreMm },
    tires.map((t) => ({ id: t.id, size: t.tire_size! })),
    wheels.map((w) => ({
      id: w.id,
      diameterIn: w.wheel_diameter_in!,
      widthIn: w.wheel_width_in!,
      offsetMm: w.wheel_offset_mm!,
      boltPattern: w.bolt_pattern!,
      beadlock: w.beadlock,
      centerBoreMm: w.center_bore_mm,
    })),
    40,
  );
  const byId = new Map([...tires, ...wheels].map((i) => [i.id, stockItemDto(i)]));
  return {
    vehicle: v,
    wheelsFitting: ranked.wheelsFitting,
    pairs: ranked.pairs,
    picks: ranked.picks.map((p) => ({ ...p, tire: byId.get(p.tireId)!, wheel: byId.get(p.wheelId)! })),
  };
});
