// Where the browser tests find the running app and the mail fake (set by scripts/test.sh).
export const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3100";
export const MAIL_URL = process.env.RESEND_BASE_URL ?? "http://127.0.0.1:3125";
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
