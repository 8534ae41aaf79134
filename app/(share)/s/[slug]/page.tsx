import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { computeComparison } from "@/lib/comparisons/compute";
import { DEFAULT_PREFS, formatLen, formatNumber, formatSpeedIn } from "@/lib/comparisons/format";
import { appOrigin } from "@/lib/platform/mail";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { getSharedComparison } from "./data";
import { ShareOriginProvider } from "./ShareOrigin";
import { SharedView } from "./SharedView";
import { sharedLoadTrail } from "./loadTrail";

/**
 * The public, read-only page of a shared comparison.
 *
 * Caching: the page is rendered once per slug and kept (`revalidate`, s-maxage for caches in
 * front). It is the same for every reader, so it is rendered without the session
 * (`force-static`: the header shows the signed-out links here). When a link dies — revoked,
 * replaced, or its comparison deleted — or the comparison changes, the route handler drops
 * the cached page (lib/comparisons/shareCache.ts; other app servers hear of it through PostgreSQL
 * NOTIFY, lib/platform/http/sharePurge.ts) and the next request renders afresh: a revoked link is a 404
 * on the next request. A shared cache in front (CDN) may keep a copy up to
 * `revalidate` seconds; that bound is why it is short.
 */
export const dynamic = "force-static";
export const revalidate = 60;
export const dynamicParams = true;
export function generateStaticParams(): { slug: string }[] {
  return [];
}

type Props = { params: Promise<{ slug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  const share = await getSharedComparison(slug);
  if (!share) return { title: "Shared comparison not available", robots: { index: false } };
  const r = computeComparison(share.input);
  const p = DEFAULT_PREFS;
  const speed = r.speedometer.bySystem[p.units];
  const title = `${share.name} — shared comparison`;
  const description = `${r.current.tireText} → ${r.planned.tireText}: diameter ${formatLen(r.changes.diameterMm, p, { signed: true })}, poke ${formatLen(r.changes.outerPokeMm, p, { signed: true })}, ${formatSpeedIn(speed.headline.actual, speed.unit)} true at ${formatSpeedIn(speed.headline.indicated, speed.unit, 0)} shown, suggested axle ratio ${formatNumber(r.gearing.suggestedRatio, 2)}.`;
  return {
    title,
    description,
    // Unlisted: only people given the link should find it.
    robots: { index: false, follow: false },
    alternates: { canonical: `/s/${slug}` },
    openGraph: { type: "article", title, description, url: `/s/${slug}`, siteName: "Hubface" },
    twitter: { card: "summary_large_image", title, description },
  };
}

export default async function SharedComparisonPage({ params }: Props) {
  const { slug } = await params;
  const share = await pageGuard(getSharedComparison(slug));
  const loadTrail = await sharedLoadTrail(share.slug, share.input.planned);
  return (
    <>
      <PageHeader
        title={share.name}
        lead={
          <>
            A shared comparison, read-only. Figures are nominal and unloaded, computed from the sizes entered.{" "}
            <span className="text-basalt-500">
              Updated{" "}
              <time dateTime={share.updatedAt}>
                {new Date(share.updatedAt).toLocaleDateString("en-US", { dateStyle: "medium", timeZone: "UTC" })}
              </time>
              .
            </span>
          </>
        }
      />
      {/* Copied links (forum post, drawing) use the public origin, not whatever address served the page. */}
      <ShareOriginProvider origin={appOrigin()}>
        <SharedView name={share.name} slug={share.slug} input={share.input} loadTrail={loadTrail} />
      </ShareOriginProvider>
    </>
  );
}
