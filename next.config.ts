import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Turbopack must not try to bundle the database drivers knex can load lazily.
  serverExternalPackages: ["knex", "mysql2", "nodemailer", "bcryptjs"],
  reactStrictMode: true,
  poweredByHeader: false,
};

export default nextConfig;
