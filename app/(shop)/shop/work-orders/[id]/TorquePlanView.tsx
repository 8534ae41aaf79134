import { torquePlan, tighteningSequence, type TorqueUnit } from "@/lib/fitment";
import { torqueWords } from "@/lib/shop/workOrders/signedText";

/** The engine's crisscross order and torque passes for a bolt count and figure (lib/fitment/tightening). */
export function TorquePlanView({ boltCount, torqueNm, unit }: { boltCount: number | null; torqueNm: number | null; unit: TorqueUnit }) {
  let order: number[] | null = null;
  try {
    order = boltCount === null ? null : tighteningSequence(boltCount);
  } catch {
    order = null;
  }
  if (!order) return null;
  const plan = torqueNm === null ? null : torquePlan({ boltCount: order.length, torqueNm });
  return (
    <div className="rounded-lg bg-basalt-50 p-3 text-sm" data-testid="torque-plan">
      <p>
        <span className="font-semibold">Order</span> (bolt 1 is the first clockwise from the valve stem): {order.join(" → ")}
      </p>
      {plan ? (
        <ol className="mt-1 list-decimal pl-5">
          {plan.passes.map((p) => (
            <li key={p.pass}>
              {p.kind === "check" ? "Check pass at" : `Pass at ${Math.round(p.fraction * 100)} %:`} {torqueWords(p.torqueNm, unit)}
            </li>
          ))}
        </ol>
      ) : (
        <p className="text-basalt-600">Enter the maker&apos;s figure to see the passes.</p>
      )}
      <p className="mt-1 text-xs text-basalt-500">
        Passes at 30, 60 and 100 % and a check pass: common practice, no source. The maker&apos;s steps win.
      </p>
    </div>
  );
}
