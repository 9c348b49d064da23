import { z } from "zod";

// Every setting the app reads lives here, validated once, so a missing or malformed value fails loudly at start-up
// instead of surfacing as an odd error deep inside a request.
const booleanish = z
  .enum(["true", "false", "1", "0"])
  .transform((value) => value === "true" || value === "1");

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().url("DATABASE_URL must be a postgres:// URL"),
  APP_URL: z.string().url().default("http://127.0.0.1:3000"),
  BETTER_AUTH_SECRET: z.string().min(32, "BETTER_AUTH_SECRET must be at least 32 characters"),
  RESEND_API_KEY: z.string().min(1, "RESEND_API_KEY is required (any value the local mail fake accepts)"),
  RESEND_BASE_URL: z.string().url().optional(),
  MAIL_FROM: z.string().min(3).default("Rampline <no-reply@rampline.example>"),
  MAIL_RETRY_LIMIT: z.coerce.number().int().min(0).max(100).default(12),
  MAIL_RETRY_DELAY_SECONDS: z.coerce.number().int().min(1).max(3600).default(30),
  RUN_JOBS: booleanish.default(true),
  // A burst of messages to one person becomes one e-mail sent this long after the first unread one.
  MESSAGE_QUIET_SECONDS: z.coerce.number().int().min(1).max(86_400).default(300),
  SIGN_IN_RATE_LIMIT_MAX: z.coerce.number().int().min(1).max(10_000).default(5),
  SIGN_IN_RATE_LIMIT_WINDOW_SECONDS: z.coerce.number().int().min(1).max(86_400).default(60),
  SECURE_COOKIES: booleanish.optional(),
  // Where uploaded photos are kept on local disk (the default storage); never inside public/.
  STORAGE_DIR: z.string().min(1).default(".data/uploads"),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function env(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join(".")}: ${issue.message}`);
    throw new Error(`Rampline's configuration is invalid:\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}
