import { inject } from "vitest";

// lib/server reads its configuration from the environment, as it does in the app.
process.env.DATABASE_URL = inject("databaseUrl");
process.env.NEXTAUTH_SECRET ??= "integration-tests-only-secret-0123456789";
process.env.SEEPLINE_BCRYPT_COST = "10";
