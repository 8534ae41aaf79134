import Link from "next/link";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { currentCaller } from "@/lib/platform/auth/session";

/** The tools anyone can use at once: no account, nothing to sign. */
const FREE_TOOLS = [
  {
    href: "/workspace",
    title: "Workspace",
    body: "Compare what you run with what you plan — tire size, wheel width, offset or backspacing, spacer — and see how diameter, clearance, poke, scrub, speedometer and engine speed change.",
  },
  {
    href: "/convert",
    title: "Converter",
    body: "Tire sizes between inch and metric designations, and the lengths, pressures and torques of the trade.",
  },
  {
    href: "/beadlock",
    title: "Ring helper",
    body: "How many bolts hold a beadlock ring, the order to tighten them in and the passes to make, with the ring maker's figures.",
  },
];

/** What an account adds on top; the tools above never ask for one. */
const ACCOUNT_ADDS = [
  "Save comparisons and come back to them.",
  "Share a read-only link to a comparison, for a forum thread or a friend.",
  "Keep your vehicles and their measured clearances in a garage.",
];

export default async function HomePage() {
  const caller = await currentCaller().catch(() => null);
  return (
    <div className="flex flex-col gap-10">
      <section className="rounded-card bg-basalt-900 px-6 py-12 text-dune-50 sm:px-10">
        <p className="text-sm font-semibold uppercase tracking-widest text-ember-300">Wheel and tire fitment</p>
        <h1 className="mt-2 max-w-3xl text-4xl font-bold">Fit bigger tires with the numbers in front of you.</h1>
        <p className="mt-4 max-w-2xl text-lg text-basalt-200">
          Hubface turns a tire size and a wheel into the figures that decide whether a setup fits: how far the tire reaches inboard and
          outboard of the hub face, how much taller it stands, what it does to the speedometer and to engine speed.
        </p>
        <p className="mt-4 max-w-2xl text-lg font-semibold text-dune-50">
          The workspace, the converter and the ring helper are free, and you need no account to use them.
        </p>
        <div className="mt-6 flex flex-wrap gap-3">
          <Link href="/workspace" className={buttonClass("primary")}>
            Open the workspace
          </Link>
          {caller ? (
            <Link href="/comparisons" className={buttonClass("secondary")}>
              My comparisons
            </Link>
          ) : (
            <Link href="/convert" className={buttonClass("secondary")}>
              Open the converter
            </Link>
          )}
        </div>
      </section>

      <section aria-labelledby="free-tools-title">
        <h2 id="free-tools-title" className="text-xl font-semibold">
          Free, no account needed
        </h2>
        <div className="mt-3 grid gap-4 md:grid-cols-3">
          {FREE_TOOLS.map((t) => (
            <Card key={t.href}>
              <h3 className="text-lg font-semibold">
                <Link href={t.href} className="underline decoration-ember-400 underline-offset-4 hover:text-ember-700">
                  {t.title}
                </Link>
              </h3>
              <p className="mt-2 text-sm text-basalt-600">{t.body}</p>
            </Card>
          ))}
        </div>
      </section>

      <section aria-labelledby="account-title" className="grid gap-4 md:grid-cols-2">
        <Card>
          <h2 id="account-title" className="text-lg font-semibold">
            What an account adds
          </h2>
          <p className="mt-1 text-sm text-basalt-600">An account is free too. It is only for keeping and sharing your work:</p>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm text-basalt-700">
            {ACCOUNT_ADDS.map((a) => (
              <li key={a}>{a}</li>
            ))}
          </ul>
          {caller ? (
            <p className="mt-4 text-sm text-basalt-700">
              You are signed in.{" "}
              <Link href="/account" className="font-semibold underline underline-offset-4">
                Go to your account
              </Link>
              .
            </p>
          ) : (
            <div className="mt-4 flex flex-wrap gap-3">
              <Link href="/sign-up" className={buttonClass("secondary")}>
                Create a free account
              </Link>
              <Link href="/sign-in" className={buttonClass("ghost")}>
                Sign in
              </Link>
            </div>
          )}
        </Card>
        <Card>
          <h2 className="text-lg font-semibold">Quote it at the counter</h2>
          <p className="mt-2 text-sm text-basalt-600">
            Shops price tires, wheels and the work a change needs — mounting, beadlock assembly, trimming, alignment — and send the quote.
          </p>
        </Card>
      </section>
    </div>
  );
}
