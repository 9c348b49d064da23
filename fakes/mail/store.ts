import { randomUUID } from "node:crypto";
import { mkdir, readFile, rename, rm, writeFile } from "node:fs/promises";
import { dirname } from "node:path";
import {
  storeFileSchema,
  type IdempotencyRecord,
  type IdempotencyScope,
  type StoredMessage,
  type StoreFile,
} from "./store-schema";

export interface MessageStore {
  /** Newest first. */
  list(): StoredMessage[];
  get(id: string): StoredMessage | undefined;
  findIdempotency(scope: IdempotencyScope, key: string): IdempotencyRecord | undefined;
  add(messages: StoredMessage[], record?: IdempotencyRecord): Promise<void>;
  clear(): Promise<number>;
  /** Resolves once every change made so far is on disk. */
  flush(): Promise<void>;
}

interface StoreOptions {
  path: string;
  now: () => Date;
  idempotencyTtlMs: number;
}

async function loadFile(path: string): Promise<StoreFile> {
  let text: string;
  try {
    text = await readFile(path, "utf8");
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return { version: 1, messages: [], idempotency: [] };
    throw error;
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new Error(`The mail store ${path} is not valid JSON. Move it aside or delete it to start with an empty mailbox.`);
  }
  const parsed = storeFileSchema.safeParse(json);
  if (!parsed.success) {
    throw new Error(`The mail store ${path} is not in the expected format. Move it aside or delete it to start afresh.`);
  }
  return parsed.data;
}

// A crash halfway through writeFile would leave a truncated store; rename is atomic on the same file system, so
// readers only ever see the old file or the complete new one.
async function writeAtomically(path: string, data: StoreFile): Promise<void> {
  await mkdir(dirname(path), { recursive: true });
  const temp = `${path}.${process.pid}.${randomUUID()}.tmp`;
  try {
    await writeFile(temp, `${JSON.stringify(data, null, 2)}\n`, "utf8");
    await rename(temp, path);
  } catch (error) {
    await rm(temp, { force: true });
    throw error;
  }
}

export async function openMessageStore({ path, now, idempotencyTtlMs }: StoreOptions): Promise<MessageStore> {
  const state = await loadFile(path);
  // Writes are chained so two quick requests cannot rename their files out of order and lose the later change.
  let pending: Promise<void> = Promise.resolve();

  const isLive = (record: IdempotencyRecord) =>
    now().getTime() - Date.parse(record.createdAt) < idempotencyTtlMs;

  const persist = (): Promise<void> => {
    const write = pending.then(() => writeAtomically(path, state));
    pending = write.catch(() => undefined);
    return write;
  };

  return {
    list: () => [...state.messages].reverse(),
    get: (id) => state.messages.find((message) => message.id === id),
    findIdempotency: (scope, key) =>
      state.idempotency.find((record) => record.scope === scope && record.key === key && isLive(record)),
    add(messages, record) {
      state.messages.push(...messages);
      state.idempotency = state.idempotency.filter(isLive);
      if (record) state.idempotency.push(record);
      return persist();
    },
    async clear() {
      const count = state.messages.length;
      state.messages = [];
      state.idempotency = [];
      await persist();
      return count;
    },
    flush: () => pending,
  };
}
