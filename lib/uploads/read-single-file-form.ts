import { Readable } from "node:stream";
import type { ReadableStream as NodeReadableStream } from "node:stream/web";
import busboy from "busboy";
import type { AppError } from "@/lib/errors";
import { MAX_TEXT_FIELD_BYTES, MAX_TEXT_FIELDS, MULTIPART_OVERHEAD_BYTES } from "./limits";
import { fileTooLarge, malformedUpload, notMultipart, oneFileOnly, unexpectedFields } from "./upload-errors";

// The file's bytes only: its name and declared type are ignored on purpose (the content decides what it is, and a
// file name can carry personal details we do not want to keep).
export type SingleFileForm = { fields: Record<string, string>; file: Buffer | null };
export type ReadSingleFileFormOptions = { fileField: string; maxFileBytes: number };

const MULTIPART = /^multipart\/form-data\s*(;|$)/i;

// Streams a multipart/form-data body through busboy, holding at most maxFileBytes of the one file in memory.
// Any limit stops the read at once and cancels the request body, so an oversized upload is never read to the end.
export async function readSingleFileForm(request: Request, options: ReadSingleFileFormOptions): Promise<SingleFileForm> {
  const contentType = request.headers.get("content-type") ?? "";
  if (!MULTIPART.test(contentType)) throw notMultipart();
  const declared = Number(request.headers.get("content-length") ?? "");
  if (declared > options.maxFileBytes + MULTIPART_OVERHEAD_BYTES) {
    await request.body?.cancel().catch(() => undefined);
    throw fileTooLarge(options.maxFileBytes);
  }
  if (!request.body) return { fields: {}, file: null };

  let parser: busboy.Busboy;
  try {
    parser = busboy({
      headers: { "content-type": contentType },
      defParamCharset: "utf8",
      // No separate `parts` limit: busboy signals it on reaching the count rather than exceeding it, and any
      // part beyond one file and MAX_TEXT_FIELDS fields already trips the files or fields limit below.
      // busboy reports 'limit' on reaching fileSize bytes, not on passing it: one byte more lets a file of exactly
      // maxFileBytes through and still stops the first byte beyond.
      limits: { files: 1, fileSize: options.maxFileBytes + 1, fields: MAX_TEXT_FIELDS, fieldSize: MAX_TEXT_FIELD_BYTES },
    });
  } catch {
    // busboy throws at once when the boundary is missing.
    throw malformedUpload();
  }
  const source = Readable.fromWeb(request.body as NodeReadableStream<Uint8Array>);
  const busboyParser = parser;

  return new Promise<SingleFileForm>((resolve, reject) => {
    const fields = new Map<string, string>();
    let file: Buffer | null = null;
    let settled = false;

    const fail = (error: AppError) => {
      if (settled) return;
      settled = true;
      reject(error);
      // Torn down on the next tick: busboy is still inside its own event handler (it touches the file stream
      // right after emitting 'limit') and breaks if destroyed under its feet.
      process.nextTick(() => {
        source.unpipe(busboyParser);
        source.destroy();
        busboyParser.destroy();
      });
    };

    source.on("error", () => fail(malformedUpload()));
    busboyParser.on("file", (name, stream) => {
      stream.on("error", () => fail(malformedUpload()));
      // A file under another name is not the photo; it is drained and the form then lacks its photo.
      if (name !== options.fileField) {
        stream.resume();
        return;
      }
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("limit", () => fail(fileTooLarge(options.maxFileBytes)));
      stream.on("end", () => {
        if (!stream.truncated) file = Buffer.concat(chunks);
      });
    });
    busboyParser.on("field", (name, value, info) => {
      if (info.nameTruncated || info.valueTruncated) return fail(unexpectedFields());
      if (!fields.has(name)) fields.set(name, value);
    });
    busboyParser.on("filesLimit", () => fail(oneFileOnly()));
    busboyParser.on("fieldsLimit", () => fail(unexpectedFields()));
    busboyParser.on("error", () => fail(malformedUpload()));
    // 'close' comes after every part, and the file's stream, has been read to its end.
    busboyParser.on("close", () => {
      if (settled) return;
      settled = true;
      resolve({ fields: Object.fromEntries(fields), file });
    });
    source.pipe(busboyParser);
  });
}
