// @ts-check

/** @type {import('next').NextConfig} */
const nextConfig = {
  poweredByHeader: false,
  // forbidden() renders app/forbidden.tsx with status 403 when a role lacks the right for a page.
  // The proxy sees every request's body; a data-logger upload may hold up to 32 MB (scripts/app-server.mjs
  // refuses more before Next.js reads it).
  experimental: { authInterrupts: true, proxyClientMaxBodySize: 33 * 1024 * 1024 },
  // Chromium is driven from the server for PDFs; keep puppeteer out of the bundle.
  serverExternalPackages: ["puppeteer", "puppeteer-core"],
};

module.exports = nextConfig;
