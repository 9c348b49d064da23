import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin, organization } from "better-auth/plugins";
import { db } from "@/db/client";
import * as schema from "@/db/schema";
import { enqueueEmail } from "@/lib/email/enqueue";
import { env } from "@/lib/env";
import { INVITATION_LIFETIME_SECONDS, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "./constants";
import { accessControl, organizationRoles } from "./roles";

const config = env();
const secureCookies = config.SECURE_COOKIES ?? config.APP_URL.startsWith("https://");

export const auth = betterAuth({
  appName: "Rampline",
  // Failed sign-ins are expected in tests; elsewhere they are worth a warning in the log.
  logger: { level: config.NODE_ENV === "test" ? "error" : "warn" },
  baseURL: config.APP_URL,
  secret: config.BETTER_AUTH_SECRET,
  trustedOrigins: [config.APP_URL],
  database: drizzleAdapter(db(), { provider: "pg", schema }),
  emailAndPassword: {
    enabled: true,
    // Nobody joins a clinic on their own: accounts are created when an invitation is accepted.
    disableSignUp: true,
    minPasswordLength: PASSWORD_MIN_LENGTH,
    maxPasswordLength: PASSWORD_MAX_LENGTH,
    resetPasswordTokenExpiresIn: 60 * 60,
    revokeSessionsOnPasswordReset: true,
    sendResetPassword: async ({ user, token }) => {
      await enqueueEmail({
        template: "password-reset",
        to: user.email,
        data: { name: user.name, url: `${config.APP_URL}/reset-password?token=${encodeURIComponent(token)}` },
      });
    },
  },
  session: {
    expiresIn: 60 * 60 * 24 * 7,
    updateAge: 60 * 60 * 24,
  },
  rateLimit: {
    // On in every environment, production builds included; counters are shared through PostgreSQL.
    enabled: true,
    storage: "database",
    modelName: "rateLimit",
    window: 60,
    max: 120,
    customRules: {
      "/sign-in/email": { window: config.SIGN_IN_RATE_LIMIT_WINDOW_SECONDS, max: config.SIGN_IN_RATE_LIMIT_MAX },
      "/request-password-reset": { window: 60 * 15, max: 5 },
      "/reset-password": { window: 60 * 15, max: 10 },
    },
  },
  advanced: {
    useSecureCookies: secureCookies,
    defaultCookieAttributes: { httpOnly: true, sameSite: "lax", secure: secureCookies },
  },
  plugins: [
    organization({
      ac: accessControl,
      roles: organizationRoles,
      creatorRole: "admin",
      allowUserToCreateOrganization: false,
      invitationExpiresIn: INVITATION_LIFETIME_SECONDS,
      schema: {
        invitation: {
          additionalFields: {
            inviteeName: { type: "string", required: false, input: true },
            clientId: { type: "string", required: false, input: true },
          },
        },
      },
    }),
    // Used for its ban fields and checks: deactivating a therapist bans the account and ends its sessions.
    admin(),
    nextCookies(),
  ],
});

export type AuthSession = typeof auth.$Infer.Session;
