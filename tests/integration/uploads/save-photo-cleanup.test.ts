import { afterAll, describe, expect, it, vi } from "vitest";
import { objectStorage, type ObjectStorage } from "@/lib/storage";
import { processImage } from "@/lib/uploads/process-image";
import { savePhoto } from "@/lib/uploads/save-photo";
import { createClinic, createPerson } from "../../support/factories";
import { solidImage } from "../../unit/uploads/support/test-images";
import { removeStorageRoot, storedState } from "./support/upload-requests";

vi.hoisted(() => {
  process.env.STORAGE_DIR = `${process.env.STORAGE_DIR ?? ".data/uploads-test"}/cleanup-${process.pid}-${Date.now()}`;
});
afterAll(removeStorageRoot);

// A store that works until its nth write, then fails, as a full disk or a dropped connection would.
function failingOnPut(n: number): ObjectStorage {
  const real = objectStorage();
  let puts = 0;
  return {
    put: async (key, bytes, type) => {
      puts += 1;
      if (puts >= n) throw new Error("simulated storage failure");
      return real.put(key, bytes, type);
    },
    get: (key) => real.get(key),
    delete: (key) => real.delete(key),
  };
}

describe("a photo that cannot be saved completely leaves nothing behind", async () => {
  const clinic = await createClinic();
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const image = await processImage(await solidImage(50, 40));
  const input = { organizationId: clinic.organizationId, clientId: client.clientId!, kind: "skin" as const, uploadedById: client.userId, image };

  it("saves both renditions and the row when nothing fails (so the counts below can move)", async () => {
    const before = await storedState(input.clientId);
    await savePhoto(input);
    expect(await storedState(input.clientId)).toEqual({ rows: before.rows + 1, files: before.files + 2 });
  });

  it("removes the display rendition when the thumbnail cannot be written", async () => {
    const before = await storedState(input.clientId);
    await expect(savePhoto(input, failingOnPut(2))).rejects.toThrow("simulated storage failure");
    expect(await storedState(input.clientId)).toEqual(before);
  });

  it("removes both renditions when the row cannot be inserted", async () => {
    const before = await storedState(input.clientId);
    const real = objectStorage();
    const written: string[] = [];
    const recording: ObjectStorage = { ...real, put: (key, bytes, type) => (written.push(key), real.put(key, bytes, type)) };
    // A client id that does not exist breaks the row's foreign key, after both files are written.
    await expect(savePhoto({ ...input, clientId: `missing-${crypto.randomUUID()}` }, recording)).rejects.toThrow();
    expect(written).toHaveLength(2);
    expect(await storedState(input.clientId)).toEqual(before);
  });
});
