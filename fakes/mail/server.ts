import { createMailFake, type MailFake } from "./app";
import { readMailFakeConfig } from "./config";

const result = readMailFakeConfig(process.env);
if (!result.ok) {
  console.error(`The mail fake cannot start:\n${result.errors.map((error) => `  - ${error}`).join("\n")}`);
  process.exit(1);
}
for (const warning of result.warnings) console.warn(`Warning: ${warning}`);

let fake: MailFake;
try {
  fake = await createMailFake({ ...result.config, log: (line) => console.log(`[mail-fake] ${line}`) });
} catch (error) {
  console.error(`The mail fake cannot start: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}

console.log(`Mail fake listening on ${fake.url}`);
console.log(`  mailbox:  ${fake.url}/`);
console.log(`  store:    ${fake.storePath}`);
console.log(`  app env:  RESEND_BASE_URL=${fake.url} and RESEND_API_KEY set to MAIL_FAKE_API_KEY`);

let stopping = false;
function stop(signal: NodeJS.Signals): void {
  if (stopping) return;
  stopping = true;
  console.log(`[mail-fake] ${signal} received, finishing writes and stopping`);
  // A stuck keep-alive client must not keep the process alive forever after Ctrl+C.
  setTimeout(() => process.exit(1), 5_000).unref();
  fake.close().then(
    () => process.exit(0),
    (error: unknown) => {
      console.error(`[mail-fake] stopping failed: ${error instanceof Error ? error.message : String(error)}`);
      process.exit(1);
    },
  );
}
process.once("SIGINT", stop);
process.once("SIGTERM", stop);
