// Shared by better-auth's configuration, the zod schemas and the invitation commands.
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 128;
export const INVITATION_LIFETIME_SECONDS = 7 * 24 * 60 * 60;
