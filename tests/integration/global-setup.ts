import type { TestProject } from "vitest/node";
import { createTestDatabase } from "../support/test-database";

declare module "vitest" {
  export interface ProvidedContext {
    databaseUrl: string;
    ownerDatabaseUrl: string;
  }
}

// One fresh database for the whole integration run; tests make their own unique data with factories.
export default async function setup(project: TestProject) {
  const db = await createTestDatabase("it");
  console.log(`integration tests: ${db.mode} database, fresh for this run`);
  project.provide("databaseUrl", db.url);
  project.provide("ownerDatabaseUrl", db.ownerUrl);
  return async () => db.drop();
}
