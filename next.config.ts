import withSerwistInit from "@serwist/next";
import type { NextConfig } from "next";
import { PHASE_DEVELOPMENT_SERVER, PHASE_PRODUCTION_SERVER } from "next/constants";
// Validate the environment once, when the app is built and when it starts.
import { assertServerCanStart, env } from "./lib/env";
import { NON_PAGE_CSP, SERVICE_WORKER_CSP } from "./lib/http/content-security-policy";
import { securityHeaders } from "./lib/http/security-headers";

const https = env.APP_URL.startsWith("https:");
const toList = (headers: Record<string, string>) =>
  Object.entries(headers).map(([key, value]) => ({ key, value }));

// The service worker (app/sw.ts) precaches the app shell; Serwist's plugin needs webpack builds.
const withSerwist = withSerwistInit({
  swSrc: "app/sw.ts",
  swDest: "public/sw.js",
  // The offline fallback page is a route, so it is not in the build's static files: add it.
  additionalPrecacheEntries: [{ url: "/~offline", revision: "offline-1" }],
  reloadOnOnline: false, // a scrutineer mid-entry must never lose the screen to a reload
  cacheOnNavigation: true,
});

const nextConfig: NextConfig = {
  distDir: env.NEXT_DIST_DIR,
  poweredByHeader: false,
  reactStrictMode: true,
  // `npm test` runs `tsc --noEmit` over the whole project before it builds; no need to do it twice.
  typescript: { ignoreBuildErrors: true },
  serverExternalPackages: ["mysql2", "bcryptjs"],
  // Server actions' bodies are capped per page by proxy.ts; this is Next's own backstop.
  experimental: { authInterrupts: true, serverActions: { bodySizeLimit: "1mb" } },
  // Pages get their CSP (with a nonce) from proxy.ts; everything else gets one here.
  async headers() {
    return [
      { source: "/:path*", headers: toList(securityHeaders({ https })) },
      {
        source: "/api/:path*",
        headers: [{ key: "Content-Security-Policy", value: NON_PAGE_CSP }],
      },
      {
        source: "/sw.js",
        headers: [{ key: "Content-Security-Policy", value: SERVICE_WORKER_CSP }],
      },
      {
        source: "/swe-worker-:hash.js",
        headers: [{ key: "Content-Security-Policy", value: SERVICE_WORKER_CSP }],
      },
    ];
  },
};

// A server (`next start`, `next dev`) refuses to start live without its own secret and address;
// a build needs neither, so `next build` works with no environment at all.
export default function config(phase: string): NextConfig {
  if (phase === PHASE_PRODUCTION_SERVER || phase === PHASE_DEVELOPMENT_SERVER) {
    assertServerCanStart(process.env);
  }
  return withSerwist(nextConfig);
}
