import type { HubCheck } from "@/lib/shop/quotes/document";

const TONE = { refuse: "text-contact-800", caution: "text-tight-800", ok: "text-basalt-700" } as const;
const WORD = { refuse: "Does not fit", caution: "Check", ok: "Fits" } as const;

/** Each wheel line's bolt pattern and centre bore against the vehicle's hub, worst first. */
export function HubChecksList({ checks }: { checks: readonly HubCheck[] }) {
  if (checks.length === 0) return <p className="mt-1 text-sm text-basalt-600">No wheel on this quote.</p>;
  return (
    <ul className="mt-2 flex flex-col gap-2 text-sm" data-testid="hub-checks">
      {checks.map((c) => (
        <li key={c.line}>
          <span className="font-medium">
            Line {c.line}: {c.description}
          </span>
          <ul className="mt-0.5 list-disc pl-5">
            {c.findings.map((f) => (
              <li key={f.code} className={TONE[f.level]}>
                <span className="font-semibold">{WORD[f.level]}:</span> {f.message}
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ul>
  );
}
