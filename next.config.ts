import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Turbopack must not try to bundle the database drivers knex can load lazily.
  serverExternalPackages: ["knex", "mysql2", "nodemailer", "bcryptjs"],
  // Tests build into their own folder so they never clobber the build `npm start` serves.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  reactStrictMode: true,
  poweredByHeader: false,
};

export default nextConfig;
