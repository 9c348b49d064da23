// Seeds the invented demo clinic. Safe to run again: it adds only what is missing.
import { db, pool } from "../db/client";
import { seedDemo } from "../db/seed/seed-demo";

seedDemo(db())
  .then(({ created }) => console.log(created ? `[seed] added ${created} demo rows` : "[seed] demo data already present"))
  .catch((error) => {
    console.error("[seed] failed:", error);
    process.exitCode = 1;
  })
  .finally(() => pool().end());
