import "server-only";
import { eq } from "drizzle-orm";
import { db, type Database } from "../client";
import { account, session, user } from "../schema";

export async function getUserByEmail(email: string, executor: Database = db()) {
  const [row] = await executor.select().from(user).where(eq(user.email, email)).limit(1);
  return row ?? null;
}

// Creates a person with an e-mail-and-password credential in better-auth's own tables and format.
export async function insertUserWithPassword(
  values: { id: string; name: string; email: string; passwordHash: string },
  executor: Database = db(),
): Promise<void> {
  await executor.insert(user).values({ id: values.id, name: values.name, email: values.email, emailVerified: true });
  await executor.insert(account).values({
    id: crypto.randomUUID(),
    accountId: values.id,
    providerId: "credential",
    userId: values.id,
    password: values.passwordHash,
  });
}

export async function setUserBannedById(userId: string, banned: boolean, reason: string | null, executor: Database = db()) {
  await executor.update(user).set({ banned, banReason: banned ? reason : null }).where(eq(user.id, userId));
  // A deactivated person is signed out everywhere at once.
  if (banned) await executor.delete(session).where(eq(session.userId, userId));
}

export async function getUserById(userId: string, executor: Database = db()) {
  const [row] = await executor.select().from(user).where(eq(user.id, userId)).limit(1);
  return row ?? null;
}
