import { defineConfig } from "drizzle-kit";

// drizzle-kit only generates SQL from db/schema.ts here; migrations are applied by scripts/migrate.ts.
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema.ts",
  out: "./db/migrations",
  casing: "snake_case",
  dbCredentials: { url: process.env.DATABASE_URL ?? "postgres://localhost/rampline" },
});
