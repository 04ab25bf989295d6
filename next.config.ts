import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // A second build folder lets a check build run beside a serving app (TANKWRIGHT_DIST_DIR).
  distDir: process.env.TANKWRIGHT_DIST_DIR ?? ".next",
  poweredByHeader: false,
  reactStrictMode: true,
  // The app never fetches anything from the internet at build or run time.
  images: { unoptimized: true },
  serverExternalPackages: ["@node-rs/argon2", "pg"],
};

export default nextConfig;
