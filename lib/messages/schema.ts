import { z } from "zod";

export const postMessageSchema = z.object({
  body: z.string({ error: "Write a message." }).trim().min(1, "Write a message.").max(4000, "Keep a message under 4,000 characters."),
  photoIds: z.array(z.string().min(1).max(100)).max(4, "Attach at most 4 photos.").default([]),
  about: z.object({ type: z.enum(["check-in", "flag", "version"]), id: z.string().min(1).max(100) }).optional(),
});
export type PostMessageInput = z.input<typeof postMessageSchema>;
