import { afterAll, inject } from "vitest";

// lib/server reads its configuration from the environment, as it does in the app.
process.env.DATABASE_URL = inject("databaseUrl");
process.env.NEXTAUTH_SECRET ??= "integration-tests-only-secret-0123456789";
process.env.SEEPLINE_BCRYPT_COST = "10";

// An operation that renders a PDF (issuing a certificate) starts Chromium; close it with each test file, so no
// browser outlives the run. Imported late: lib/server must see the environment above first.
afterAll(async () => {
  const { closePdfBrowser } = await import("@/lib/server/pdf/render-pdf");
  await closePdfBrowser();
});
