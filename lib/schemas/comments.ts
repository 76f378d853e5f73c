// Timed comments: plain text at a frame of a clip.
import { z } from "zod";

export const COMMENT_MAX_CHARS = 4000;

// Control characters other than tab and newline (and carriage return, normalised away) are refused.
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

export const commentBody = z
  .string()
  .transform((s) => s.replace(/\r\n?/g, "\n"))
  .refine((s) => !CONTROL.test(s), "Plain text only: control characters are not allowed")
  .refine((s) => s.trim().length >= 1, "Write something first")
  .refine((s) => s.length <= COMMENT_MAX_CHARS, `At most ${COMMENT_MAX_CHARS} characters`);

export const commentCreateSchema = z
  .object({
    body: commentBody,
    frame: z.number().int().nonnegative().optional(),
    parentId: z.string().uuid().optional(),
  })
  .strict()
  .refine((v) => v.frame !== undefined || v.parentId !== undefined, { message: "A comment needs a frame", path: ["frame"] });

export const commentResolveSchema = z.object({ resolved: z.boolean() }).strict();

export type CommentCreate = z.infer<typeof commentCreateSchema>;
