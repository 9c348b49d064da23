// Applies the committed Drizzle migrations and prepares pg-boss's schema.
//   tsx scripts/migrate.ts             migrate the database in DATABASE_URL
//   tsx scripts/migrate.ts --create    create that database first if it is missing
//   tsx scripts/migrate.ts --recreate  drop and create it (the test command's clean slate)
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Client } from "pg";
import PgBoss from "pg-boss";
import { env } from "../lib/env";
import { QUEUE_POLICIES, QUEUES } from "../lib/jobs/boss";

async function ensureDatabase(url: string, recreate: boolean) {
  const target = new URL(url);
  const name = decodeURIComponent(target.pathname.slice(1));
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`Refusing an unusual database name: ${name}`);
  const admin = new URL(url);
  admin.pathname = "/postgres";
  const client = new Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    if (recreate) await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    const { rowCount } = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [name]);
    if (!rowCount) {
      await client.query(`CREATE DATABASE ${name}`);
      console.log(`[migrate] created database ${name}`);
    }
  } finally {
    await client.end();
  }
}

async function main() {
  const url = env().DATABASE_URL;
  const args = new Set(process.argv.slice(2));
  if (args.has("--create") || args.has("--recreate")) await ensureDatabase(url, args.has("--recreate"));

  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    await migrate(drizzle(client), { migrationsFolder: new URL("../db/migrations", import.meta.url).pathname });
  } finally {
    await client.end();
  }

  const boss = new PgBoss({ connectionString: url, max: 2 });
  await boss.start();
  for (const name of Object.values(QUEUES)) await boss.createQueue(name, { name, ...(QUEUE_POLICIES[name] ? { policy: QUEUE_POLICIES[name] } : {}) });
  await boss.stop({ graceful: false, wait: true });
  console.log("[migrate] database is up to date");
}

main().catch((error) => {
  console.error("[migrate] failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});
