import type { NextConfig } from "next";
import { COMMON_SECURITY_HEADERS, NON_PAGE_POLICY, STATIC_POLICY } from "./lib/api/content-security";

const nextConfig: NextConfig = {
  // Turbopack must not bundle the database drivers knex loads lazily, nor the queue client (Lua scripts, sockets).
  serverExternalPackages: ["knex", "mysql2", "nodemailer", "bcryptjs", "bullmq", "ioredis"],
  // Tests build into their own folder so they never clobber the build `npm start` serves.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  reactStrictMode: true,
  poweredByHeader: false,
  // forbidden() from next/navigation: admin-only pages answer a real 403 (lib/auth/page-access.ts).
  experimental: { authInterrupts: true },
  async headers() {
    return [
      { source: "/:path*", headers: COMMON_SECURITY_HEADERS },
      // Pages get a policy with a fresh nonce from proxy.ts; everything else gets this one.
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: NON_PAGE_POLICY }] },
      { source: "/_next/:path*", headers: [{ key: "Content-Security-Policy", value: STATIC_POLICY }] },
      { source: "/icon.svg", headers: [{ key: "Content-Security-Policy", value: NON_PAGE_POLICY }] },
    ];
  },
};

export default nextConfig;
