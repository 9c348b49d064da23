// Seeds the invented demo clinic. Safe to run again: it adds only what is missing.
import { db, pool } from "../db/client";
import { seedDemo } from "../db/seed/seed-demo";
import { seedDemoCheckIns } from "../db/seed/seed-check-ins";
import { seedDemoProgrammes } from "../db/seed/seed-programmes";
import { stopBoss } from "../lib/jobs/boss";

async function main() {
  const { created } = await seedDemo(db());
  const programmes = await seedDemoProgrammes(db());
  const checkIns = await seedDemoCheckIns(db());
  return created + programmes + checkIns;
}

main()
  .then((created) => console.log(created ? `[seed] added ${created} demo records` : "[seed] demo data already present"))
  .catch((error) => {
    console.error("[seed] failed:", error);
    process.exitCode = 1;
  })
  // Publishing queues "there is an update" e-mails, which starts the job queue: stop it so the script can end.
  .finally(async () => {
    await stopBoss();
    await pool().end();
  });
