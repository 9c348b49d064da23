// Puts a published programme version and placement photos straight into the test database, so the handout route
// has something to print without going through the builder. Every value is invented test data.
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { programme, programmeVersion } from "@/db/schema";
import type { Actor } from "@/lib/auth/actor";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { processImage } from "@/lib/uploads/process-image";
import { savePhoto } from "@/lib/uploads/save-photo";

export async function publishVersion(client: Actor, author: Actor, content: ProgrammeContent, number = 1) {
  const clientId = client.clientId!;
  await db().insert(programme).values({ clientId }).onConflictDoNothing({ target: programme.clientId });
  const [row] = await db().select().from(programme).where(eq(programme.clientId, clientId));
  await db().insert(programmeVersion).values({ programmeId: row!.id, number, content, reason: "First programme", authorId: author.userId });
}

// Through the same processing and storage as an upload: a re-encoded JPEG under random keys, and its photo row.
export async function storePlacementPhoto(client: Actor, therapist: Actor, bytes: Buffer) {
  const image = await processImage(bytes);
  return savePhoto({ organizationId: client.organizationId, clientId: client.clientId!, kind: "placement", uploadedById: therapist.userId, image });
}
