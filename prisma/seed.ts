// Seeds the invented demo scenario into an empty database. Usage: tsx --conditions=react-server prisma/seed.ts
// (the condition lets lib/server modules load outside Next.js). Refuses to touch a database that has users.
import { createDb } from "@/lib/server/db/client";
import { withActor } from "@/lib/server/db/transaction";
import { buildDemoScenario } from "./seed/demo-scenario";

export async function seedIfEmpty(databaseUrl: string): Promise<boolean> {
  const db = createDb(databaseUrl);
  try {
    if ((await db.user.count()) > 0) return false;
    await withActor({ id: "system:demo-seed" }, (tx) => buildDemoScenario(tx), { db, timeoutMs: 300_000 });
    return true;
  } finally {
    await db.$disconnect();
  }
}

if (require.main === module) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error("DATABASE_URL is not set.");
    process.exit(2);
  }
  seedIfEmpty(url)
    .then((seeded) => console.log(seeded ? "Demo scenario seeded." : "Database already has data; seed skipped."))
    .catch((error) => {
      console.error(error);
      process.exit(1);
    });
}
