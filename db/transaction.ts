import { drizzle } from "drizzle-orm/node-postgres";
import type PgBoss from "pg-boss";
import type { Database } from "./client";
import { pool } from "./client";
import * as schema from "./schema";

export type Transaction = Database;
// Lets pg-boss insert a job on the same connection, so a record and the e-mail it triggers commit together or not at all.
export type JobExecutor = PgBoss.Db;

export async function inTransaction<T>(work: (tx: Transaction, jobs: JobExecutor) => Promise<T>): Promise<T> {
  const connection = await pool().connect();
  try {
    await connection.query("BEGIN");
    const tx = drizzle(connection, { schema, casing: "snake_case" });
    const result = await work(tx, { executeSql: (text, values) => connection.query(text, values) });
    await connection.query("COMMIT");
    return result;
  } catch (error) {
    await connection.query("ROLLBACK").catch(() => undefined);
    throw error;
  } finally {
    connection.release();
  }
}
