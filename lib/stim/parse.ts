import type { z } from "zod";
import { channelSettingsSchema, type ChannelSettings } from "./schema";

/** Field path ("electrodes.0.diameter", "waveform.secondPhaseAmplitudeMa") → message. */
export type FieldErrors = Record<string, string>;

/** Key used for a problem with the input as a whole (not an object, for instance). */
export const ROOT_FIELD = "_root";

export type ParseResult =
  | { success: true; data: ChannelSettings }
  | { success: false; fieldErrors: FieldErrors; issues: z.core.$ZodIssue[] };

export function fieldPath(path: readonly PropertyKey[]): string {
  return path.length === 0 ? ROOT_FIELD : path.map(String).join(".");
}

/** The first message for each field: one message per field is what a form can show. */
export function toFieldErrors(issues: readonly z.core.$ZodIssue[]): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of issues) {
    const key = fieldPath(issue.path);
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

/** Parses one channel's settings; on failure returns field-level messages for a 400 response. */
export function parseChannelSettings(input: unknown): ParseResult {
  const result = channelSettingsSchema.safeParse(input);
  if (result.success) return { success: true, data: result.data };
  return { success: false, fieldErrors: toFieldErrors(result.error.issues), issues: result.error.issues };
}
