// Runs once when a server instance starts: the job workers (e-mail) run inside every web instance.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { env } = await import("./lib/env");
  if (!env().RUN_JOBS) return;
  const { startWorkers } = await import("./lib/jobs/workers");
  await startWorkers();
  console.log("[jobs] workers started");
}
