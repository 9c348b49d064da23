import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { env } from "@/lib/env";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;

// One pool per process; kept on globalThis so hot reloads in development do not open a new pool each time.
const globalForDb = globalThis as unknown as { ramplinePool?: Pool; ramplineDb?: Database };

export function pool(): Pool {
  globalForDb.ramplinePool ??= new Pool({ connectionString: env().DATABASE_URL, max: 10 });
  return globalForDb.ramplinePool;
}

export function db(): Database {
  globalForDb.ramplineDb ??= drizzle(pool(), { schema, casing: "snake_case" });
  return globalForDb.ramplineDb;
}
