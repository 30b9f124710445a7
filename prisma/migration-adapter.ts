import { PrismaPg } from "@prisma/adapter-pg";
import pg from "pg";
import { UTC_SESSION_OPTIONS } from "../lib/server/db/utc-session";

// Two defects of @prisma/adapter-pg 6.19 on the migration path, mended here for the migration CLI only:
// 1. The JavaScript schema engine reads catalog columns of type `name` (oid 19) and `"char"` (oid 18), which the
//    adapter cannot map ("Column type 'name' could not be deserialized"). Both arrive as text on the wire, so
//    reporting them as `text` (oid 25) is exact.
// 2. executeScript splits a migration on every ";", which breaks function bodies ($$ ... $$). A script without
//    parameters can go to PostgreSQL whole, as one simple query, which runs it in one implicit transaction.
const CATALOG_TEXT_OIDS = new Set([18, 19]);
const TEXT_OID = 25;

type QueryResultLike = { fields?: Array<{ dataTypeID: number }> };
type Queryable = { query: (...args: unknown[]) => unknown };
type AdapterInternals = { client: Queryable; onError(error: unknown): never; executeScript(script: string): Promise<void> };

function reportCatalogTypesAsText<T>(result: T): T {
  const fields = (result as QueryResultLike | undefined)?.fields;
  if (fields) for (const field of fields) if (CATALOG_TEXT_OIDS.has(field.dataTypeID)) field.dataTypeID = TEXT_OID;
  return result;
}

function patchClient(client: pg.PoolClient): void {
  const target = client as unknown as Queryable;
  const query = target.query.bind(client);
  target.query = (...args: unknown[]) => {
    // pg.Pool#query calls the client with a callback; a checked-out client is used with promises.
    const last = args[args.length - 1];
    if (typeof last === "function") {
      const callback = last as (error: unknown, result: unknown) => void;
      return query(...args.slice(0, -1), (error: unknown, result: unknown) =>
        callback(error, error ? result : reportCatalogTypesAsText(result)),
      );
    }
    const outcome = query(...args);
    return outcome instanceof Promise ? outcome.then(reportCatalogTypesAsText) : outcome;
  };
}

class MigrationAdapterFactory extends PrismaPg {
  override async connect() {
    const adapter = await super.connect();
    const internals = adapter as unknown as AdapterInternals;
    internals.executeScript = async (script: string) => {
      try {
        await internals.client.query(script);
      } catch (error) {
        internals.onError(error);
      }
    };
    return adapter;
  }
}

export function createMigrationAdapter(connectionString: string): PrismaPg {
  const pool = new pg.Pool({ connectionString, max: 2, options: UTC_SESSION_OPTIONS });
  pool.on("connect", patchClient);
  return new MigrationAdapterFactory(pool, { disposeExternalPool: true });
}
