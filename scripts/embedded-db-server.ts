// The embedded PostgreSQL for a machine with no server: PGlite over the PostgreSQL wire protocol on loopback.
// Usage: tsx scripts/embedded-db-server.ts <data dir | memory://> <port>
import { mkdirSync } from "node:fs";
import { PGlite } from "@electric-sql/pglite";
import { PGLiteSocketServer } from "@electric-sql/pglite-socket";
import { prepareEmbeddedRoles } from "./support/embedded-roles";

async function main() {
  const [dataDir, portText] = process.argv.slice(2);
  const port = Number(portText);
  if (!dataDir || !Number.isInteger(port)) throw new Error("usage: embedded-db-server <data dir | memory://> <port>");
  if (!dataDir.startsWith("memory://")) mkdirSync(dataDir, { recursive: true });

  const db = await PGlite.create(dataDir);
  // The roles of a production server, on the one shared session PGlite has (see support/embedded-roles.ts).
  await prepareEmbeddedRoles(db);
  // The app's pool, the migration CLI and a seed may all connect at once; queries are queued per transaction.
  const server = new PGLiteSocketServer({ db, port, host: "127.0.0.1", maxConnections: 64 });
  await server.start();
  console.log(`EMBEDDED_DB_READY port=${port} data=${dataDir}`);

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    await server.stop().catch(() => undefined);
    await db.close().catch(() => undefined);
    process.exit(0);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  // Ends with its parent even if the parent dies without signalling.
  process.on("disconnect", stop);
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
