import { describe, expect, it } from "vitest";
import { readSingleFileForm } from "@/lib/uploads/read-single-file-form";

const URL_ = "http://127.0.0.1:3000/upload";
const options = { fileField: "photo", maxFileBytes: 1024 };

function formRequest(parts: Array<[string, string | Blob, string?]>) {
  const form = new FormData();
  for (const [name, value, filename] of parts) {
    if (typeof value === "string") form.append(name, value);
    else form.append(name, value, filename);
  }
  return new Request(URL_, { method: "POST", body: form });
}

// A body written by hand, streamed in chunks with no Content-Length, as a chunked upload would arrive.
function streamedRequest(chunks: Iterable<Uint8Array>, headers: Record<string, string> = {}) {
  const iterator = chunks[Symbol.iterator]();
  let pulled = 0;
  // highWaterMark 0: a chunk is produced only when the reader asks, so `pulled` is what was actually read.
  const body = new ReadableStream<Uint8Array>(
    {
      pull(controller) {
        const next = iterator.next();
        if (next.done) return controller.close();
        pulled += next.value.byteLength;
        controller.enqueue(next.value);
      },
    },
    { highWaterMark: 0 },
  );
  const request = new Request(URL_, {
    method: "POST",
    headers: { "content-type": "multipart/form-data; boundary=XyZ", ...headers },
    body,
    duplex: "half",
  } as RequestInit);
  return { request, pulled: () => pulled };
}

const encode = (text: string) => new TextEncoder().encode(text);
const filePartHead = (boundary: string) =>
  encode(`--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`);

async function refusal(promise: Promise<unknown>) {
  const error = (await promise.then(() => null, (caught: unknown) => caught)) as { status?: number; message?: string } | null;
  expect(error, "expected a refusal").not.toBeNull();
  return { status: error?.status, message: error?.message };
}

describe("readSingleFileForm", () => {
  it("returns the text fields and the file's bytes, up to and including the size cap", async () => {
    const bytes = new Uint8Array(1024).fill(7);
    const form = await readSingleFileForm(formRequest([["kind", "skin"], ["photo", new Blob([bytes], { type: "image/jpeg" }), "x.jpg"]]), options);
    expect(form.fields).toEqual({ kind: "skin" });
    expect(form.file?.length).toBe(1024);
  });

  it("answers 415 to anything but multipart/form-data", async () => {
    for (const type of ["application/json", "text/plain", "multipart/mixed; boundary=a", "application/x-www-form-urlencoded"]) {
      const request = new Request(URL_, { method: "POST", headers: { "content-type": type }, body: "{}" });
      expect((await refusal(readSingleFileForm(request, options))).status, type).toBe(415);
    }
    expect((await refusal(readSingleFileForm(new Request(URL_, { method: "POST", body: null }), options))).status).toBe(415);
  });

  it("answers 413 one byte over the cap", async () => {
    const request = formRequest([["photo", new Blob([new Uint8Array(1025)]), "x.jpg"]]);
    expect(await refusal(readSingleFileForm(request, options))).toEqual({ status: 413, message: "The photo is larger than 1 KB." });
  });

  it("stops reading an oversized upload at the cap instead of reading it to the end", async () => {
    const cap = 1024 * 1024;
    const chunk = new Uint8Array(64 * 1024);
    const endless = (function* () {
      yield filePartHead("XyZ");
      for (let sent = 0; sent < 64 * cap; sent += chunk.byteLength) yield chunk; // 64 MiB if read to the end
    })();
    const { request, pulled } = streamedRequest(endless);
    expect((await refusal(readSingleFileForm(request, { fileField: "photo", maxFileBytes: cap }))).status).toBe(413);
    expect(pulled()).toBeLessThan(cap + 8 * chunk.byteLength);
  });

  it("refuses an upload declaring a length far over the cap without reading it", async () => {
    const { request, pulled } = streamedRequest([new Uint8Array(10)], { "content-length": "50000000" });
    expect((await refusal(readSingleFileForm(request, options))).status).toBe(413);
    expect(pulled()).toBe(0);
  });

  it("answers 400 to a second file, too many fields or an overlong field", async () => {
    const file = () => new Blob([new Uint8Array(10)]);
    const twoFiles = formRequest([["photo", file(), "a.jpg"], ["photo", file(), "b.jpg"]]);
    expect(await refusal(readSingleFileForm(twoFiles, options))).toEqual({ status: 400, message: "Send one photo at a time." });
    const manyFields = formRequest(["a", "b", "c", "d", "e"].map((name): [string, string] => [name, "1"]));
    expect((await refusal(readSingleFileForm(manyFields, options))).status).toBe(400);
    const longField = formRequest([["kind", "x".repeat(2000)]]);
    expect((await refusal(readSingleFileForm(longField, options))).status).toBe(400);
  });

  it("answers 400 to a body without a boundary or cut off before its end", async () => {
    const noBoundary = new Request(URL_, { method: "POST", headers: { "content-type": "multipart/form-data" }, body: "x" });
    expect((await refusal(readSingleFileForm(noBoundary, options))).status).toBe(400);
    const { request } = streamedRequest([filePartHead("XyZ"), new Uint8Array(20)]); // no closing boundary
    expect(await refusal(readSingleFileForm(request, options))).toEqual({
      status: 400,
      message: "The upload was incomplete or malformed. Please try again.",
    });
  });

  it("treats a file under another field name as no photo", async () => {
    const form = await readSingleFileForm(formRequest([["picture", new Blob([new Uint8Array(10)]), "x.jpg"]]), options);
    expect(form.file).toBeNull();
  });
});
