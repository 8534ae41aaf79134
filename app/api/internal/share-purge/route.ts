import { NextResponse, type NextRequest } from "next/server";
import { isLocalPurgeToken, isShareSlug, LOCAL_PURGE_HEADER } from "@/lib/platform/http/sharePurge";
import { dropLocalCachedShare } from "@/lib/comparisons/shareCache";

/**
 * The server's own request (scripts/serve.ts) when another server changed a share page: Next's
 * page cache can only be revalidated inside a request, so the PostgreSQL listener asks its own
 * server here. Only a caller holding this process's token gets past the 404 (lib/platform/http/sharePurge.ts).
 * Body: the slug as text, or "*" for every share page.
 */
export const dynamic = "force-dynamic";

const NOT_FOUND = () => NextResponse.json({ message: "Not found." }, { status: 404, headers: { "Cache-Control": "no-store" } });

export async function POST(req: NextRequest): Promise<NextResponse> {
  if (!isLocalPurgeToken(req.headers.get(LOCAL_PURGE_HEADER))) return NOT_FOUND();
  const slug = (await req.text()).trim();
  if (slug !== "*" && !isShareSlug(slug)) return NextResponse.json({ message: "Not a share slug." }, { status: 400 });
  dropLocalCachedShare(slug === "*" ? null : slug);
  return new NextResponse(null, { status: 204, headers: { "Cache-Control": "no-store" } });
}
