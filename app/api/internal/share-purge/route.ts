import { NextResponse, type NextRequest } from "next/server";
import { HttpError } from "@/lib/platform/http/errors";
import { readCappedBytes } from "@/lib/platform/http/body";
import { isLocalPurgeToken, isShareSlug, LOCAL_PURGE_HEADER } from "@/lib/platform/http/sharePurge";
import { dropLocalCachedShare } from "@/lib/comparisons/shareCache";

/**
 * The server's own request (scripts/serve.ts) when another server changed a share page: Next's
 * page cache can only be revalidated inside a request, so the PostgreSQL listener asks its own
 * server here. Only a caller holding this process's token gets past the 404 (lib/platform/http/sharePurge.ts).
 * Body: the slug as text, or "*" for every share page — read with a cap (a slug is short), so even
 * a token holder cannot make the server buffer a large body.
 */
const MAX_BODY_BYTES = 256;
export const dynamic = "force-dynamic";

const NOT_FOUND = () => NextResponse.json({ message: "Not found." }, { status: 404, headers: { "Cache-Control": "no-store" } });

export async function POST(req: NextRequest): Promise<NextResponse> {
  if (!isLocalPurgeToken(req.headers.get(LOCAL_PURGE_HEADER))) return NOT_FOUND();
  let slug: string;
  try {
    slug = new TextDecoder().decode(await readCappedBytes(req, MAX_BODY_BYTES, "A share purge names one slug.")).trim();
  } catch (error) {
    if (error instanceof HttpError) return NextResponse.json({ message: error.message }, { status: error.status });
    throw error;
  }
  if (slug !== "*" && !isShareSlug(slug)) return NextResponse.json({ message: "Not a share slug." }, { status: 400 });
  dropLocalCachedShare(slug === "*" ? null : slug);
  return new NextResponse(null, { status: 204, headers: { "Cache-Control": "no-store" } });
}
