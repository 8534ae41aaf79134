import Link from "next/link";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { currentCaller } from "@/lib/auth/session";

const JOBS = [
  { title: "Compare what you run with what you plan", body: "Tire size, wheel width, offset or backspacing, spacer: see how diameter, clearance, poke, scrub, speedometer and engine speed change." },
  { title: "Know where it will rub", body: "Keep your vehicle's measured clearances and see which points a planned setup closes up, before you buy or trim." },
  { title: "Quote it at the counter", body: "Shops price tires, wheels and the work a change needs — mounting, beadlock assembly, trimming, alignment — and send the quote." },
];

export default async function HomePage() {
  const caller = await currentCaller().catch(() => null);
  return (
    <div className="flex flex-col gap-10">
      <section className="rounded-card bg-basalt-900 px-6 py-12 text-dune-50 sm:px-10">
        <p className="text-sm font-semibold uppercase tracking-widest text-ember-300">Wheel and tire fitment</p>
        <h1 className="mt-2 max-w-3xl text-4xl font-bold">Fit bigger tires with the numbers in front of you.</h1>
        <p className="mt-4 max-w-2xl text-lg text-basalt-200">
          Hubface turns a tire size and a wheel into the figures that decide whether a setup fits: how far the tire reaches
          inboard and outboard of the hub face, how much taller it stands, what it does to the speedometer and to engine speed.
        </p>
        <div className="mt-6 flex flex-wrap gap-3">
          {caller ? (
            <Link href="/account" className={buttonClass("primary")}>Go to your account</Link>
          ) : (
            <>
              <Link href="/sign-up" className={buttonClass("primary")}>Create a free account</Link>
              <Link href="/sign-in" className={buttonClass("secondary")}>Sign in</Link>
            </>
          )}
        </div>
      </section>
      <section className="grid gap-4 md:grid-cols-3" aria-label="What Hubface does">
        {JOBS.map((j, i) => (
          <Card key={j.title}>
            <h2 className="text-lg font-semibold">
              {i === 0 ? (
                <Link href="/workspace" className="underline decoration-ember-400 underline-offset-4 hover:text-ember-700">
                  {j.title}
                </Link>
              ) : (
                j.title
              )}
            </h2>
            <p className="mt-2 text-sm text-basalt-600">{j.body}</p>
          </Card>
        ))}
      </section>
    </div>
  );
}
