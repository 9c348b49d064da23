// What the rest of Rampline may ask of a store of private files. Keys are opaque ids the server made with
// newStorageKey(); the store never sees a file name that came from a person.
export type StoredObject = { bytes: Buffer; contentType: string };

export interface ObjectStorage {
  // Writes the whole object or nothing: a reader never sees half a file under the key.
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  // null when there is no object under the key.
  get(key: string): Promise<StoredObject | null>;
  // Removing a key that is already gone is not an error, so clean-up can be retried.
  delete(key: string): Promise<void>;
}
