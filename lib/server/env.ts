import "server-only";
import { z } from "zod";

// Read once, checked once: a missing or malformed variable stops the app with a sentence that says which.
const envSchema = z.object({
  DATABASE_URL: z.string().url("DATABASE_URL must be a postgresql:// address."),
  NEXTAUTH_SECRET: z.string().min(32, "NEXTAUTH_SECRET must be at least 32 characters (npm start generates one locally)."),
  SEEPLINE_DATABASE_MODE: z.enum(["embedded", "external"]).default("external"),
  SEEPLINE_SESSION_HOURS: z.coerce.number().positive().max(24 * 30).default(10),
  CHROME_PATH: z.string().optional(),
});
export type Env = z.infer<typeof envSchema>;

let cached: Env | null = null;

export function getEnv(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join(".")}: ${issue.message}`);
    throw new Error(`Seepline cannot start, its configuration is incomplete:\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}
