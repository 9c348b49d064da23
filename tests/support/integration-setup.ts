// Runs before every integration test file. These tests write to a real database, so refuse anything but a test one.
const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set: run the integration tests through scripts/test.sh.");
if (!new URL(url).pathname.endsWith("_test")) {
  throw new Error(`Integration tests only run against a database whose name ends in _test (got ${new URL(url).pathname}).`);
}
// The in-process mail fake of the queue tests listens here; no other integration test sends mail.
process.env.RESEND_BASE_URL = `http://127.0.0.1:${process.env.RAMPLINE_INTEGRATION_MAIL_PORT ?? "3126"}`;
process.env.MAIL_RETRY_DELAY_SECONDS ??= "1";
process.env.MESSAGE_QUIET_SECONDS ??= "2";
