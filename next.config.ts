import type { NextConfig } from "next";
// Validate the environment once, when the app is built and when it starts.
import { env } from "./lib/env";

const nextConfig: NextConfig = {
  distDir: env.NEXT_DIST_DIR,
  poweredByHeader: false,
  reactStrictMode: true,
  // `npm test` runs `tsc --noEmit` over the whole project before it builds; no need to do it twice.
  typescript: { ignoreBuildErrors: true },
  experimental: { authInterrupts: true },
  serverExternalPackages: ["mysql2", "bcryptjs"],
};

export default nextConfig;
