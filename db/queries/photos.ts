import "server-only";
import { eq, inArray } from "drizzle-orm";
import { db, type Database } from "../client";
import { photo, type NewPhoto } from "../schema";

export async function insertPhoto(values: NewPhoto, executor: Database = db()) {
  const [row] = await executor.insert(photo).values(values).returning();
  if (!row) throw new Error("Photo insert returned nothing.");
  return row;
}

export async function getPhotoById(photoId: string, executor: Database = db()) {
  const [row] = await executor.select().from(photo).where(eq(photo.id, photoId)).limit(1);
  return row ?? null;
}

export async function listPhotosByIds(photoIds: string[], executor: Database = db()) {
  if (photoIds.length === 0) return [];
  return executor.select().from(photo).where(inArray(photo.id, photoIds));
}
