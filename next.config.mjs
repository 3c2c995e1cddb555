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
  // Type errors are caught by the separate `tsc --noEmit` step of npm test,
  // which covers scripts and tests too.
  typescript: { ignoreBuildErrors: true },
  serverExternalPackages: ["@node-rs/argon2", "knex", "pg", "pg-boss", "pdfkit"],
  // forbidden() in requirePageMember (app/_lib/access.ts) renders app/forbidden.tsx with a 403.
  experimental: { authInterrupts: true },
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
