// Security headers on every response; the CSP allows only our own origin
// (Next inlines small bootstrap scripts, hence 'unsafe-inline' for scripts
// until nonces are wired through the proxy).
const csp = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-inline'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "frame-ancestors 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join("; ");

/** @type {import('next').NextConfig} */
const nextConfig = {
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // The build type-checks the app (tsc --noEmit in npm test covers scripts and tests too).
  serverExternalPackages: ["@node-rs/argon2", "knex", "pg", "pg-boss", "pdfkit"],
  experimental: {
    // forbidden() in requirePageMember (app/_lib/access.ts) renders app/forbidden.tsx with a 403.
    authInterrupts: true,
    // Server actions read their bodies in Next itself, which counts while it streams; past this limit it
    // fails the request (as a 500), so app/_lib/page-body-guard.ts refuses larger posts to page paths
    // first, with the same bound. Our forms carry a few fields; route() bodies have the same limit.
    serverActions: { bodySizeLimit: "256kb" },
    // Bodies never reach the proxy (its matcher skips requests that have one); were one to, Next would
    // copy at most this much of it for the proxy.
    proxyClientMaxBodySize: "256kb",
  },
  async headers() {
    return [
      {
        source: "/:path*",
        headers: [
          { key: "Content-Security-Policy", value: csp },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "same-origin" },
          { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
        ],
      },
    ];
  },
};

export default nextConfig;
