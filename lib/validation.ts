import type { z } from "zod";
import { AppError, type FieldErrors } from "./errors";

// Turns zod issues into one message per field path ("carerEmail", "electrodes.0.diameter"), the shape every form
// and every 400 response in Rampline uses.
export function fieldErrorsFrom(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join(".") : "_root";
    fields[key] ??= issue.message;
  }
  return fields;
}

// Parses input for a command; bad input becomes a 400 with one message per field, never a 500.
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const parsed = schema.safeParse(input);
  if (!parsed.success) throw new AppError("VALIDATION", "Some fields need attention.", fieldErrorsFrom(parsed.error));
  return parsed.data;
}
