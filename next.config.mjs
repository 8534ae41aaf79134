const isDev = process.env.NODE_ENV !== "production";

// Next's runtime inlines small bootstrap scripts, so script-src needs 'unsafe-inline';
// dev mode's fast refresh also needs eval. Everything else is locked to our own origin.
const csp = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline'${isDev ? " 'unsafe-eval'" : ""}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "frame-ancestors 'none'",
  "form-action 'self'",
  "base-uri 'self'",
  "object-src 'none'",
].join("; ");

// scripts/test.sh type-checks the whole tree (tsc --noEmit) before it builds, once, on a tree it
// throws away: there the build's own type pass (~40 s) and its on-disk cache (~10 s) are waste.
const testBuild = process.env.HUBFACE_TEST_BUILD === "1";

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Next hashes the whole HTML of every cached (static) page on every request to make an ETag;
  // on the share page that was about a third of the server's time per view. Dynamic pages get
  // no ETag anyway, and shared caches in front (CDN) validate on their own copy, so none is made.
  generateEtags: false,
  typescript: { ignoreBuildErrors: testBuild },
  experimental: { turbopackFileSystemCacheForBuild: !testBuild },
  serverExternalPackages: ["knex", "pg", "nodemailer", "bcryptjs", "pdfkit", "pg-boss", "pino", "pino-pretty"],
  async headers() {
    return [
      {
        source: "/:path*",
        headers: [
          { key: "Content-Security-Policy", value: csp },
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
          { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
          ...(isDev ? [] : [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }]),
        ],
      },
    ];
  },
};

export default nextConfig;
