// @ts-check

/** @type {import('next').NextConfig} */
const nextConfig = {
  poweredByHeader: false,
  // forbidden() renders app/forbidden.tsx with status 403 when a role lacks the right for a page.
  experimental: { authInterrupts: true },
  // Chromium is driven from the server for PDFs; keep puppeteer out of the bundle.
  serverExternalPackages: ["puppeteer", "puppeteer-core"],
};

module.exports = nextConfig;
