import { defineConfig } from "prisma/config";
import { createMigrationAdapter } from "./prisma/migration-adapter";

// JavaScript engines only: the native engines would be downloaded from a server this lab's machines cannot reach.
export default defineConfig({
  engine: "js",
  experimental: { adapter: true },
  schema: "prisma/schema.prisma",
  migrations: { path: "prisma/migrations" },
  async adapter() {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set: the migration command needs a database to apply to.");
    return createMigrationAdapter(url);
  },
});
