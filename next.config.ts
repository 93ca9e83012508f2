import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Turbopack must not bundle the database drivers knex loads lazily, nor the queue client (Lua scripts, sockets).
  serverExternalPackages: ["knex", "mysql2", "nodemailer", "bcryptjs", "bullmq", "ioredis"],
  // Tests build into their own folder so they never clobber the build `npm start` serves.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // `npm test` type-checks the whole tree once with tsc; the build need not repeat it.
  typescript: { ignoreBuildErrors: true },
  reactStrictMode: true,
  poweredByHeader: false,
};

export default nextConfig;
