import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  reactStrictMode: true,
  // The app never fetches anything from the internet at build or run time.
  images: { unoptimized: true },
  serverExternalPackages: ["@node-rs/argon2", "pg"],
};

export default nextConfig;
